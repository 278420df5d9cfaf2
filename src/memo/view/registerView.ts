// The assumptions register as the memo prints it: for each choice the entry most series share
// (same value, same basis, same setter) once, under "every series unless listed below", and per
// series only the choices that are its own: entries that differ from the shared one and what the
// data decided (ARMA orders, the recommended model). A reviewer reads each default once.
import { noLinks } from '../format/noLinks.js';
import type { Assumption, MemoInput } from '../memoInput.js';
import { LABELS } from '../wording.js';
import type { SeriesView } from './seriesView.js';

export interface RegisterRow {
  choice: string;
  value: string;
  basis: string;
  setBy: string;
}

export interface RegisterView {
  intro: string;
  /** Choices common to every series; empty with a single series (its table says it all). */
  shared: RegisterRow[];
  sharedTitle: string;
  series: { anchor: string; title: string; rows: RegisterRow[] }[];
}

const sameAs = (a: Assumption) => (b: Assumption) => a.choice === b.choice && a.value === b.value && a.basis === b.basis && a.set_by === b.set_by;

function row(a: Assumption): RegisterRow {
  return { choice: noLinks(a.choice), value: noLinks(a.value), basis: noLinks(a.basis), setBy: LABELS.setByValue[a.set_by] };
}

export function registerView(input: MemoInput, series: readonly SeriesView[]): RegisterView {
  const lists = input.series.map((entry) => entry.assumptions);
  const shared = lists.length < 2 ? [] : sharedEntries(lists);
  return {
    intro: LABELS.registerIntro,
    shared: shared.map(row),
    sharedTitle: LABELS.allSeries,
    series: lists.map((list, i) => ({
      anchor: series[i].anchor,
      title: series[i].title,
      rows: list.filter((a) => !shared.some(sameAs(a))).map(row),
    })),
  };
}

/**
 * Per choice, the entry the most series share when at least two do (ties: the first series' in
 * order). What the data decided is each series' own even when two series happen to agree.
 */
function sharedEntries(lists: readonly Assumption[][]): Assumption[] {
  const choices = [...new Set(lists.flatMap((list) => list.map((a) => a.choice)))];
  return choices.flatMap((choice) => {
    const entries = lists.flatMap((list) => list.filter((a) => a.choice === choice && a.set_by !== 'data'));
    let best: { entry: Assumption; count: number } | null = null;
    for (const entry of entries) {
      const count = entries.filter(sameAs(entry)).length;
      if (best === null || count > best.count) best = { entry, count };
    }
    return best !== null && best.count >= 2 ? [best.entry] : [];
  });
}
