// The command recorded in the manifest and the memo's appendix, written as it would be typed
// in the config's own folder: the same whatever the working folder of the run, so reruns from
// anywhere give the same bytes, and no machine path appears in an output.
import { basename } from 'node:path';
import type { OutputFormat, RunPlan } from '../config/runPlan.js';
import { posixRelative } from './manifest.js';

/** A word as a POSIX shell reads it: quoted only when it holds anything beyond plain path characters. */
export function shellWord(word: string): string {
  return /^[\w@%+=:,./-]+$/.test(word) ? word : `'${word.replaceAll("'", "'\\''")}'`;
}

export function recordedCommand(plan: Pick<RunPlan, 'configFile' | 'baseDir'>, options: { outputFolder?: string; formats?: readonly OutputFormat[] }): string {
  const words = ['trendbrief', 'run', shellWord(basename(plan.configFile))];
  if (options.outputFolder !== undefined) words.push('--out', shellWord(posixRelative(plan.baseDir, options.outputFolder)));
  if (options.formats !== undefined) words.push('--formats', options.formats.join(','));
  return words.join(' ');
}
