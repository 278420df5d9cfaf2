// The order a batch runs its configs in. Configs run as given, except that the as-of memos of
// one memo (same memo id and output folder) run in period order, each after the one before it
// has been written, so a later month sees the earlier ones of the same batch beside it (its
// revisions and track record read them from disk). Memos of different ids keep their places
// and may still run side by side.
import { byRecency, isEarlierAsOf, monthSpan } from '../run/findEarlierRecord.js';

export interface BatchEntry {
  /** `<output folder>/<memo id>`; absent for a config that does not load. */
  idFolder?: string;
  asOf?: string;
}

export interface BatchOrder {
  /** Config indices in the order they run. */
  order: number[];
  /** For each config, the configs that must be done before it starts: the earlier periods of its memo. */
  after: number[][];
}

export function batchOrder(entries: readonly BatchEntry[]): BatchOrder {
  const order = entries.map((_, index) => index);
  const after: number[][] = entries.map(() => []);
  const groups = new Map<string, number[]>();
  entries.forEach(({ idFolder, asOf }, index) => {
    if (idFolder === undefined || asOf === undefined || monthSpan(asOf) === null) return;
    groups.set(idFolder, [...(groups.get(idFolder) ?? []), index]);
  });
  for (const members of groups.values()) {
    // Earliest period first (byRecency puts the most recent first).
    const byPeriod = [...members].sort((a, b) => byRecency(entries[b].asOf ?? '', entries[a].asOf ?? ''));
    // The group keeps the batch positions it holds, filled in period order.
    members.forEach((slot, k) => (order[slot] = byPeriod[k]));
    for (const index of members) after[index] = members.filter((other) => isEarlierAsOf(entries[other].asOf ?? '', entries[index].asOf ?? ''));
  }
  return { order, after };
}
