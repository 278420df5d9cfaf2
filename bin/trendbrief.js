#!/usr/bin/env node
// The command line from the bundle of dist/ (scripts/bundleCli.mjs, run by npm run build).
import { runCli } from '../dist/bundle/cli.js';

process.exitCode = await runCli(process.argv.slice(2));
