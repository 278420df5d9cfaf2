// The run date shown in a memo: from SOURCE_DATE_EPOCH when set (reproducible builds
// convention, reproducible-builds.org), otherwise today, as YYYY-MM-DD in UTC.
import { InputError } from '../base/problem.js';
import { runMessages } from './messages.js';

export function runDate(env: NodeJS.ProcessEnv = process.env, now: () => Date = () => new Date()): string {
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch === undefined || epoch === '') return now().toISOString().slice(0, 10);
  if (!/^\d+$/.test(epoch)) {
    throw new InputError(runMessages.badSourceDateEpoch(epoch));
  }
  return new Date(Number(epoch) * 1000).toISOString().slice(0, 10);
}
