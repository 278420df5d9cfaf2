// Rules that span several keys, which a JSON Schema cannot state: series ids unique across the
// list, reviewers listed once, and every sign-off by a listed reviewer. They read the partial
// document validation leaves, so they still run when other keys are wrong.
import { closestName } from '../base/closestName.js';
import { configMessages } from './messages.js';
import type { ConfigDocument, Loose } from './configSpec.js';
import type { Validation } from './validateNode.js';

export function checkConfigRules(doc: Loose<ConfigDocument>, v: Validation): void {
  checkUnique(
    (doc.series ?? []).map((entry) => entry?.id),
    (index) => `series[${index}].id`,
    v,
    (at, id, firstField, firstLine) => configMessages.duplicateSeriesId(at, id, firstField, firstLine),
  );
  const reviewers = doc.memo?.reviewers ?? [];
  const names = reviewers.map((entry) => entry?.name);
  checkUnique(names, (index) => `memo.reviewers[${index}].name`, v, (at, name, _field, firstLine) => configMessages.duplicateReviewer(at, name, firstLine));
  // A reviewer whose own entry is broken is already reported; checking sign-offs against a
  // partial list would only repeat that problem under another name.
  const listed = names.filter((name): name is string => name !== undefined);
  if (listed.length !== reviewers.length) return;
  (doc.memo?.sign_off ?? []).forEach((entry, index) => {
    const name = entry?.reviewer;
    const field = `memo.sign_off[${index}].reviewer`;
    const at = v.positions.get(field);
    if (name === undefined || at === undefined || listed.includes(name)) return;
    v.problems.push(configMessages.unknownReviewer({ file: v.file, ...at, field }, name, listed, closestName(name, listed)));
  });
}

function checkUnique(
  values: readonly (string | undefined)[],
  fieldOf: (index: number) => string,
  v: Validation,
  report: (at: { file: string; line: number; column: number; field: string }, value: string, firstField: string, firstLine: number) => Validation['problems'][number],
): void {
  const first = new Map<string, number>();
  values.forEach((value, index) => {
    const at = v.positions.get(fieldOf(index));
    if (value === undefined || at === undefined) return;
    const earlier = first.get(value);
    if (earlier === undefined) {
      first.set(value, index);
      return;
    }
    const earlierAt = v.positions.get(fieldOf(earlier));
    v.problems.push(report({ file: v.file, ...at, field: fieldOf(index) }, value, fieldOf(earlier), earlierAt?.line ?? at.line));
  });
}
