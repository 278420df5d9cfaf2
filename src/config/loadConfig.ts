// A config file from disk: size limit, encoding and file-system errors, then parseConfig.
import { dirname, resolve } from 'node:path';
import { readInputFile } from '../base/readInputFile.js';
import { configMessages } from './messages.js';
import { parseConfig } from './parseConfig.js';
import type { RunPlan } from './runPlan.js';

/** Largest config accepted, in bytes: far above any real memo, far below what could strain the parser. */
export const MAX_CONFIG_FILE_BYTES = 1024 * 1024;

/** Reads, checks and plans one config; relative paths in it are resolved against its own folder. */
export function loadConfig(file: string): RunPlan {
  const { text } = readInputFile(file, MAX_CONFIG_FILE_BYTES, configMessages);
  return parseConfig(text, file, dirname(resolve(file)));
}
