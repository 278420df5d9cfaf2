// The tool's name and version, read once from package.json (two levels up from both
// src/analysis and dist/analysis).
import { readFileSync } from 'node:fs';

let cached: { name: string; version: string } | undefined;

export function toolVersion(): { name: string; version: string } {
  if (cached === undefined) {
    const text = readFileSync(new URL('../../package.json', import.meta.url), 'utf8');
    const parsed = JSON.parse(text) as { name: string; version: string };
    cached = { name: parsed.name, version: parsed.version };
  }
  return cached;
}
