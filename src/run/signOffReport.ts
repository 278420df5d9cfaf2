// verify's lines on the sign-offs: the stored content's digest, then every sign-off recorded in
// the memo folder and in each revision it keeps (revisions/N/), judged against the current
// content and the current config's reviewers: valid, or void and why. A superseded revision's
// sign-offs were given on its own content, so against the current one they are void.
import { join } from 'node:path';
import { REVISIONS_FOLDER, revisionNumbers } from './issuedMemo.js';
import { voidReason, type ListedReviewer } from './judgeSignOffs.js';
import { verifyReport } from './messages.js';
import { readSignOffLog, type SignOffLog } from './signOffLog.js';
import type { StoredMemo } from './storedMemo.js';

const VOID_WORDS = {
  'not-listed': () => 'the reviewer is not listed in the config',
  'other-content': (given: string, current: string) => `given on content digest ${given.slice(0, 12)}…, this memo's is ${current.slice(0, 12)}…`,
  unsigned: () => 'not signed, and the config lists a public key for the reviewer',
  'bad-signature': () => 'the signature does not verify with the public key the config lists for the reviewer',
} as const;

function logLines(log: SignOffLog, reviewers: readonly ListedReviewer[], digest: string, where: string): { lines: string[]; valid: number } {
  const lines: string[] = [];
  let valid = 0;
  for (const entry of log.entries) {
    const reason = voidReason(entry, reviewers, digest);
    if (reason === null) valid += 1;
    const keyed = reviewers.some((reviewer) => reviewer.name === entry.reviewer && reviewer.public_key !== undefined);
    const verdict = reason !== null ? verifyReport.voidBecause(VOID_WORDS[reason](entry.digest, digest)) : keyed ? verifyReport.validSigned : verifyReport.valid;
    lines.push(verifyReport.signOff(where, entry.number, entry.reviewer, entry.decision, entry.date, verdict));
  }
  for (const { line } of log.unreadable) lines.push(verifyReport.unreadableSignOff(where, line));
  return { lines, valid };
}

export function signOffReport(memo: StoredMemo, reviewers: readonly ListedReviewer[]): string[] {
  const own = logLines(memo.log, reviewers, memo.digest, '');
  const earlier = revisionNumbers(memo.folder).map((n) =>
    logLines(readSignOffLog(join(memo.folder, REVISIONS_FOLDER, String(n))), reviewers, memo.digest, verifyReport.revisionPrefix(n)),
  );
  const count = memo.log.entries.length + memo.log.unreadable.length + earlier.reduce((sum, r) => sum + r.lines.length, 0);
  const valid = own.valid + earlier.reduce((sum, r) => sum + r.valid, 0);
  return [verifyReport.digest(memo.digest), verifyReport.signOffs(count, valid), ...own.lines, ...earlier.flatMap((r) => r.lines)];
}
