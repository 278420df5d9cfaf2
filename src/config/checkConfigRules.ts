// Rules that span several keys, which a JSON Schema cannot state: series ids unique across the
// list, reviewers listed once, every sign-off by a listed reviewer, and a reviewer's public key
// that parses as an Ed25519 key. They read the partial document validation leaves, so they
// still run when other keys are wrong.
import { createPublicKey } from 'node:crypto';
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
  // Steps and an end period at one level would contradict each other or say the same twice.
  const levels = [{ entry: doc.defaults, field: 'defaults' }, ...(doc.series ?? []).map((entry, index) => ({ entry, field: `series[${index}]` }))];
  for (const { entry, field } of levels) {
    const horizonAt = v.positions.get(`${field}.horizon`);
    const throughAt = v.positions.get(`${field}.through`);
    if (entry?.horizon === undefined || entry.through === undefined || horizonAt === undefined || throughAt === undefined) continue;
    v.problems.push(configMessages.horizonAndThrough({ file: v.file, ...throughAt, field: `${field}.through` }, `${field}.horizon`, horizonAt.line));
  }
  const reviewers = doc.memo?.reviewers ?? [];
  reviewers.forEach((entry, index) => {
    const field = `memo.reviewers[${index}].public_key`;
    const at = v.positions.get(field);
    if (entry?.public_key !== undefined && at !== undefined && !isEd25519PublicKey(entry.public_key)) v.problems.push(configMessages.badPublicKey({ file: v.file, ...at, field }));
  });
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

/** True when `pem` is an Ed25519 public key in PEM form (node:crypto reads it). */
export function isEd25519PublicKey(pem: string): boolean {
  try {
    return createPublicKey(pem).asymmetricKeyType === 'ed25519';
  } catch {
    return false;
  }
}
