// The memo's status and sign-off rows. Rules are our spec (src/memo/view/memoStatus.ts): a
// draft until every listed reviewer's latest decision is approved or approved-with-changes.
import { describe, expect, it } from 'vitest';
import type { MemoDetails, SignOff } from '../../src/memo/memoInput.js';
import { memoStatus } from '../../src/memo/view/memoStatus.js';
import { signOffView } from '../../src/memo/view/signOffView.js';

const reviewers = [
  { name: 'Oskar Pellin', role: 'Engagement reviewer' },
  { name: 'Ruth Anselm', role: 'Quality reviewer' },
];

function memo(signOff: SignOff[], listed = reviewers): Pick<MemoDetails, 'reviewers' | 'sign_off'> {
  return { reviewers: listed, sign_off: signOff };
}

describe('memoStatus', () => {
  it('is a draft while a listed reviewer has not signed', () => {
    const status = memoStatus(memo([{ reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'approved' }]));
    expect(status).toEqual({ state: 'draft', label: 'Draft', detail: 'Awaiting sign-off from Ruth Anselm.' });
  });
  it('is signed off once every reviewer approved, with or without changes', () => {
    const status = memoStatus(
      memo([
        { reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'approved-with-changes' },
        { reviewer: 'Ruth Anselm', date: '2026-12-02', decision: 'approved' },
      ]),
    );
    expect(status.state).toBe('signed-off');
    expect(status.label).toBe('Signed off');
  });
  it('stays a draft when a reviewer rejected, and names who', () => {
    const status = memoStatus(
      memo([
        { reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'rejected' },
        { reviewer: 'Ruth Anselm', date: '2026-12-02', decision: 'approved' },
      ]),
    );
    expect(status).toMatchObject({ state: 'draft', detail: 'Not approved by Oskar Pellin.' });
  });
  it('takes each reviewer\u2019s latest decision by date', () => {
    const status = memoStatus(
      memo([
        { reviewer: 'Ruth Anselm', date: '2026-12-03', decision: 'approved' },
        { reviewer: 'Oskar Pellin', date: '2026-12-04', decision: 'approved' },
        { reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'rejected' },
      ]),
    );
    expect(status.state).toBe('signed-off');
  });
  it('ignores sign-offs from people not listed, and is a draft with no reviewers at all', () => {
    expect(memoStatus(memo([{ reviewer: 'Someone Else', date: '2026-12-01', decision: 'approved' }])).state).toBe('draft');
    expect(memoStatus(memo([], [])).detail).toBe('No reviewers are listed, so the memo cannot be signed off.');
  });
});

describe('signOffView', () => {
  it('lists every reviewer, signed or blank, then unlisted signatories', () => {
    const rows = signOffView(
      memo([
        { reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'approved-with-changes', comment: 'See note 3.' },
        { reviewer: 'Guest Signer', date: '2026-12-02', decision: 'approved' },
      ]),
    );
    expect(rows.map((r) => [r.name, r.signed, r.decision, r.date, r.comment])).toEqual([
      ['Oskar Pellin', true, 'Approved with changes', '2026-12-01', 'See note 3.'],
      ['Ruth Anselm', false, 'Not yet signed', '', ''],
      ['Guest Signer', true, 'Approved', '2026-12-02', ''],
    ]);
  });
});
