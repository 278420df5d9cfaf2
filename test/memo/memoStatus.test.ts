// The memo's status and sign-off rows. Rules are our spec (src/memo/view/memoStatus.ts): from
// valid recorded sign-offs only, a draft until every listed reviewer's latest decision approves
// (with or without changes), returned when a reviewer's latest decision returns it; sign-offs
// typed into the config are shown as declared and never count.
import { describe, expect, it } from 'vitest';
import type { RecordedSignOff } from '../../src/memo/reviewPart.js';
import { commentResolutions, memoStatus } from '../../src/memo/view/memoStatus.js';
import { signOffView } from '../../src/memo/view/signOffView.js';

const reviewers = [
  { name: 'Oskar Pellin', role: 'Engagement reviewer' },
  { name: 'Ruth Anselm', role: 'Quality reviewer' },
];

let next = 1;
function act(reviewer: string, decision: RecordedSignOff['decision'], extra: Partial<RecordedSignOff> = {}): RecordedSignOff {
  return { number: next++, reviewer, role: '', decision, date: '2026-12-01', comment: '', resolves: [], signed: false, void_reason: null, ...extra };
}

describe('memoStatus', () => {
  it('is a draft while a listed reviewer has not recorded a decision', () => {
    expect(memoStatus(reviewers, [act('Oskar Pellin', 'approve')])).toEqual({ state: 'draft', label: 'Draft', detail: 'Awaiting a recorded sign-off from Ruth Anselm.' });
  });
  it('is signed off once every reviewer approved, with or without changes', () => {
    const status = memoStatus(reviewers, [act('Oskar Pellin', 'approve-with-changes', { comment: 'Widen the note.' }), act('Ruth Anselm', 'approve')]);
    expect(status).toMatchObject({ state: 'signed-off', label: 'Signed off' });
  });
  it('is returned when a reviewer\u2019s latest decision returns it, and names who', () => {
    const status = memoStatus(reviewers, [act('Ruth Anselm', 'approve'), act('Oskar Pellin', 'return', { comment: 'Redo the backtest.' })]);
    expect(status).toEqual({ state: 'returned', label: 'Returned', detail: 'Returned for rework by Oskar Pellin.' });
  });
  it('takes each reviewer\u2019s latest valid decision in log order, whatever the dates say', () => {
    const entries = [act('Oskar Pellin', 'return', { comment: 'x', date: '2026-12-09' }), act('Oskar Pellin', 'approve', { date: '2026-12-02' }), act('Ruth Anselm', 'approve')];
    expect(memoStatus(reviewers, entries).state).toBe('signed-off');
  });
  it('never counts a void sign-off, and is a draft with no reviewers at all', () => {
    const entries = [act('Oskar Pellin', 'approve'), act('Ruth Anselm', 'approve', { void_reason: 'other-content' })];
    expect(memoStatus(reviewers, entries).state).toBe('draft');
    expect(memoStatus([], entries).detail).toBe('No reviewers are listed, so the memo cannot be signed off.');
  });
});

describe('open comments', () => {
  it('stay open until a later valid sign-off resolves them, and say who resolved them', () => {
    const first = act('Oskar Pellin', 'approve-with-changes', { comment: 'State the drought caveat.' });
    const voidResolver = act('Ruth Anselm', 'approve', { resolves: [first.number], void_reason: 'bad-signature' });
    expect(commentResolutions([first, voidResolver]).open.map((e) => e.number)).toEqual([first.number]);
    const resolver = act('Ruth Anselm', 'approve', { resolves: [first.number], date: '2026-12-04' });
    const { open, resolvedBy } = commentResolutions([first, voidResolver, resolver]);
    expect(open).toEqual([]);
    expect(resolvedBy.get(first.number)?.number).toBe(resolver.number);
    const view = signOffView({ reviewers, sign_off: [] }, [first, voidResolver, resolver]);
    expect(view.recorded[0].notes).toEqual([`resolved by Ruth Anselm in No. ${resolver.number} on 2026-12-04`]);
    expect(view.recorded[1].void).toBe('void: its signature does not verify with the reviewer\u2019s public key');
  });
});

describe('signOffView', () => {
  it('lists every reviewer with the latest valid decision or blank, and the config\u2019s entries as declared only', () => {
    const view = signOffView(
      { reviewers, sign_off: [{ reviewer: 'Ruth Anselm', date: '2026-11-30', decision: 'approved' }] },
      [act('Oskar Pellin', 'approve-with-changes', { comment: 'See note 3.', signed: true }), act('Guest Signer', 'approve', { void_reason: 'not-listed' })],
    );
    expect(view.rows.map((r) => [r.name, r.signed, r.decision, r.comment, r.key])).toEqual([
      ['Oskar Pellin', true, 'Approved with changes', 'See note 3.', 'signed with the reviewer\u2019s key'],
      ['Ruth Anselm', false, 'Not yet signed', '', ''],
    ]);
    expect(view.recorded.map((r) => [r.reviewer, r.void])).toEqual([
      ['Oskar Pellin', ''],
      ['Guest Signer', 'void: the reviewer is not listed in the config'],
    ]);
    expect(view.declared).toEqual([{ reviewer: 'Ruth Anselm', decision: 'Approved', date: '2026-11-30', comment: '' }]);
  });
});
