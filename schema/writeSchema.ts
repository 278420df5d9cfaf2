// `npm run schema`: writes schema/config.schema.json from the config spec.
import { writeFileSync } from 'node:fs';
import { configSchemaText } from '../src/config/toJsonSchema.js';

const target = new URL('./config.schema.json', import.meta.url);
writeFileSync(target, configSchemaText());
process.stdout.write(`wrote ${target.pathname}\n`);
