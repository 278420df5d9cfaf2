// `trendbrief review` with keys and refusals, and an archived memo folder verified elsewhere
// (our spec: DEVELOPERS.md, "Self-contained memo folders, sign-offs, issued memos and revisions"). One memo, written once.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync, appendFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readPrivateKey, signEntry } from '../../src/run/reviewKeys.js';
import { signOffLine, type SignOffEntry } from '../../src/run/signOffLog.js';
import { runCli } from '../support/runCli.js';
import { fixRunDate, memoConfig, monthlyFolder, readText } from '../run/monthlySetup.js';

fixRunDate('all');

let root: string;
let folder: string;
let keys: string;
let otherKeys: string;

beforeAll(async () => {
  root = monthlyFolder('2025-11');
  keys = join(root, 'keys');
  otherKeys = join(root, 'other-keys');
  const made = await runCli(['review', '--new-key', keys]);
  expect(made.code).toBe(0);
  expect((await runCli(['review', '--new-key', otherKeys])).code).toBe(0);
  const publicPem = readFileSync(join(keys, 'review-key.pub.pem'), 'utf8');
  expect(made.stdout).toContain(publicPem.trimEnd().split('\n')[1]);
  const keyed = `    - name: A. Reviewer\n      public_key: |\n${publicPem.trimEnd().replace(/^/gm, '        ')}\n    - name: B. Checker\n`;
  writeFileSync(join(root, 'memo.yaml'), memoConfig('2025-11').replace('    - name: A. Reviewer\n', keyed));
  const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
  expect(run.code).toBe(0);
  folder = join(root, 'out/lake-outlook/2025-11');
});

describe('review refuses, exit 2, one line each, changing nothing', () => {
  it('names an unknown reviewer, a bad decision, a missing comment and a folder that is not a memo', async () => {
    const log = () => readText(folder, 'manifest.json');
    const before = log();
    const unknown = await runCli(['review', folder, '--reviewer', 'A. Reveiwer', '--decision', 'approve']);
    expect([unknown.code, unknown.errorLines]).toEqual([2, ["--reviewer: 'A. Reveiwer' is not a reviewer of this memo; the reviewers are 'A. Reviewer', 'B. Checker'; did you mean 'A. Reviewer'?"]]);
    const decision = await runCli(['review', folder, '--reviewer', 'B. Checker', '--decision', 'approved']);
    expect(decision.errorLines).toEqual(["--decision: 'approved' is not a decision; give one of approve, approve-with-changes, return"]);
    const comment = await runCli(['review', folder, '--reviewer', 'B. Checker', '--decision', 'return']);
    expect(comment.errorLines).toEqual(['--comment: a decision of return needs a comment; say what must change, e.g. --comment "State the drought caveat on page 1."']);
    const notMemo = await runCli(['review', root, '--reviewer', 'B. Checker', '--decision', 'approve']);
    expect([notMemo.code, notMemo.errorLines]).toEqual([2, [`${root}: '${root}' has no manifest.json, so it is not a memo folder; give the folder a run wrote, the one with manifest.json in it`]]);
    expect(log()).toBe(before);
  });

  it('asks a keyed reviewer for the key, and refuses a key file that is not one or not theirs', async () => {
    const needed = await runCli(['review', folder, '--reviewer', 'A. Reviewer', '--decision', 'approve']);
    expect(needed.errorLines).toEqual(["--key: 'A. Reviewer' has a public key in the config, so the sign-off must be signed; give --key with A. Reviewer's private key file"]);
    const notAKey = await runCli(['review', folder, '--reviewer', 'A. Reviewer', '--decision', 'approve', '--key', join(root, 'memo.yaml')]);
    expect(notAKey.errorLines).toEqual([`${join(root, 'memo.yaml')}: --key: is not an Ed25519 private key in PEM form; give the private key file trendbrief review --new-key wrote`]);
    const wrong = await runCli(['review', folder, '--reviewer', 'A. Reviewer', '--decision', 'approve', '--key', join(otherKeys, 'review-key.pem')]);
    expect(wrong.errorLines).toEqual([`${join(otherKeys, 'review-key.pem')}: --key: does not match the public key the config lists for 'A. Reviewer'; give A. Reviewer's own private key file`]);
    const again = await runCli(['review', '--new-key', keys]);
    expect(again.errorLines).toEqual([`${join(keys, 'review-key.pem')}: already exists, and --new-key never overwrites a key; choose another folder, or move the old key away first`]);
  });
});

describe('signed sign-offs', () => {
  it('records a signed sign-off, reports forged and unlisted entries void, and verifies an archived copy', async () => {
    const signed = await runCli(['review', folder, '--reviewer', 'A. Reviewer', '--decision', 'approve', '--key', join(keys, 'review-key.pem'), '--date', '2026-01-07']);
    expect(signed.code).toBe(0);
    expect(signed.stdout).toMatch(/^recorded No\. 1: A\. Reviewer, approve, 2026-01-07, signed on content digest [0-9a-f]{64}\n/);
    const resolvesNothing = await runCli(['review', folder, '--reviewer', 'B. Checker', '--decision', 'approve', '--resolves', '1']);
    expect(resolvesNothing.errorLines).toEqual(['--resolves: No. 1 is not an open comment of this memo; no comment is open; give only numbers of open comments, as the memo lists them']);
    expect((await runCli(['review', folder, '--reviewer', 'B. Checker', '--decision', 'approve', '--date', '2026-01-08'])).code).toBe(0);
    expect(readText(folder, 'memo.html')).toContain('Status: Signed off');

    // An archived copy: moved elsewhere, the original config and data deleted.
    const archive = join(mkdtempSync(join(tmpdir(), 'tb-archive-')), '2025-11');
    // The memo's name is a link to its current version: copy what it points at (cp -rL).
    cpSync(folder, archive, { recursive: true, dereference: true });
    const archived = await runCli(['verify', archive]);
    expect(archived.stderr).toBe('');
    expect(archived.code).toBe(0);
    expect(archived.stdout).toContain("originals: 0 found unchanged at their places, 2 not found (the memo folder's copies were used)\n");
    expect(archived.stdout).toContain("sign-offs: 2 recorded, 2 valid on this content\n  No. 1 A. Reviewer, approve, 2026-01-07: valid, signed with the reviewer's key\n  No. 2 B. Checker, approve, 2026-01-08: valid\n");
    rmSync(join(root, 'data'), { recursive: true });
    rmSync(join(root, 'memo.yaml'));
    expect((await runCli(['verify', archive])).code).toBe(0);

    // Forged entries appended by hand: a tampered comment under a real signature, a signature by
    // another key, an unsigned claim by the keyed reviewer and a sign-off by someone not listed.
    const [first] = readText(archive, 'sign-offs.jsonl').split('\n').map((line) => JSON.parse(line || '{}') as SignOffEntry);
    const forged = (number: number, fields: Partial<SignOffEntry>): SignOffEntry => ({ ...first, number, ...fields });
    const otherKey = readPrivateKey(join(otherKeys, 'review-key.pem'));
    const byOther = forged(4, { signature: null, comment: '' });
    appendFileSync(
      join(archive, 'sign-offs.jsonl'),
      [
        signOffLine(forged(3, { comment: 'added later' })),
        signOffLine({ ...byOther, signature: signEntry(byOther, otherKey) }),
        signOffLine(forged(5, { signature: null })),
        signOffLine(forged(6, { reviewer: 'C. Stranger', signature: null })),
      ].join(''),
    );
    const report = await runCli(['verify', archive]);
    expect(report.stdout).toContain(
      [
        'sign-offs: 6 recorded, 2 valid on this content',
        "  No. 1 A. Reviewer, approve, 2026-01-07: valid, signed with the reviewer's key",
        '  No. 2 B. Checker, approve, 2026-01-08: valid',
        '  No. 3 A. Reviewer, approve, 2026-01-07: void (the signature does not verify with the public key the config lists for the reviewer)',
        '  No. 4 A. Reviewer, approve, 2026-01-07: void (the signature does not verify with the public key the config lists for the reviewer)',
        '  No. 5 A. Reviewer, approve, 2026-01-07: void (not signed, and the config lists a public key for the reviewer)',
        '  No. 6 C. Stranger, approve, 2026-01-07: void (the reviewer is not listed in the config)',
      ].join('\n'),
    );
    // The log no longer has the hash the manifest records, and the memo rebuilt from it lists the void entries.
    expect(report.code).toBe(3);
    expect(report.stdout).toMatch(/ {2}sign-offs\.jsonl: SHA-256 [0-9a-f]{64}, the manifest records [0-9a-f]{64}\n/);
  });
});
