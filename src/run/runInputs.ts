// The inputs a run records in its manifest: the config (its text's digest), each series' data
// file and, for an as-of memo, the earlier record its revisions section read; each located as
// written, relative to the memo folder, and by the name of its copy inside it.
import { basename, resolve } from 'node:path';
import type { RunPlan } from '../config/runPlan.js';
import type { EarlierRecord } from './findEarlierRecord.js';
import { withCopyNames } from './inputCopies.js';
import { posixRelative, type ManifestInput } from './manifest.js';
import type { PlannedSeries } from './readPlannedSeries.js';

/** `earlier`: every earlier record read (the revisions' and the track record's), the most recent first. */
export function runInputs(plan: RunPlan, loaded: readonly PlannedSeries[], folder: string, earlier: readonly EarlierRecord[]): ManifestInput[] {
  const from = (file: string) => posixRelative(folder, file);
  const inputs: ManifestInput[] = [
    { role: 'config', path: basename(plan.configFile), from_output: from(resolve(plan.configFile)), sha256: plan.configSha256 },
    ...loaded.map(({ plan: seriesPlan, series }) => ({ role: 'data' as const, path: seriesPlan.fileAsWritten, from_output: from(seriesPlan.file), sha256: series.sha256 })),
  ];
  for (const memo of earlier) inputs.push({ role: 'earlier-record', path: `${memo.asOf}/record.json`, from_output: from(memo.file), sha256: memo.sha256 });
  return withCopyNames(inputs);
}
