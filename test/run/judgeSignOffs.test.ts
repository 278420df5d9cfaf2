// Each recorded sign-off judged valid or void (our spec: src/run/judgeSignOffs.ts), with real
// Ed25519 signatures from node:crypto (RFC 8032): a forged signature, a tampered comment, a
// missing signature, an unlisted reviewer and another digest are each void for their reason.
import { generateKeyPairSync } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { judgeSignOffs, voidReason } from '../../src/run/judgeSignOffs.js';
import { signEntry } from '../../src/run/reviewKeys.js';
import { parseSignOffLog, signOffLine, type SignOffEntry } from '../../src/run/signOffLog.js';

function pem() {
  const { publicKey, privateKey } = generateKeyPairSync('ed25519');
  return { publicKey: publicKey.export({ type: 'spki', format: 'pem' }).toString(), privateKey };
}
const ada = pem();
const mallory = pem();
const digest = 'c'.repeat(64);
const reviewers = [{ name: 'Ada Quill', role: 'engagement lead', public_key: ada.publicKey }, { name: 'Ben Moss' }];

function entry(fields: Partial<SignOffEntry>, key = ada.privateKey): SignOffEntry {
  const unsigned = { number: 1, reviewer: 'Ada Quill', role: 'engagement lead', decision: 'approve' as const, date: '2026-01-05', comment: '', resolves: [], digest, ...fields };
  return { ...unsigned, signature: fields.signature === undefined ? signEntry(unsigned, key) : fields.signature };
}

describe('voidReason', () => {
  it('accepts a signature by the listed key, and an unsigned sign-off by a reviewer without a key', () => {
    expect(voidReason(entry({}), reviewers, digest)).toBeNull();
    expect(voidReason(entry({ reviewer: 'Ben Moss', signature: null }), reviewers, digest)).toBeNull();
  });
  it('voids a signature made with another key, and one whose comment was changed after signing', () => {
    expect(voidReason(entry({}, mallory.privateKey), reviewers, digest)).toBe('bad-signature');
    const signed = entry({ decision: 'approve-with-changes', comment: 'Widen the intervals.' });
    expect(voidReason({ ...signed, comment: 'No change needed.' }, reviewers, digest)).toBe('bad-signature');
    expect(voidReason({ ...signed, number: 2 }, reviewers, digest)).toBe('bad-signature');
  });
  it('voids a keyed reviewer without a signature, a reviewer not listed, and a sign-off on other content', () => {
    expect(voidReason(entry({ signature: null }), reviewers, digest)).toBe('unsigned');
    expect(voidReason(entry({ reviewer: 'Cy Stranger', signature: null }), reviewers, digest)).toBe('not-listed');
    expect(voidReason(entry({}), reviewers, 'd'.repeat(64))).toBe('other-content');
  });
  it('marks only verified signatures as signed', () => {
    const [good, forged] = judgeSignOffs([entry({}), entry({ number: 2 }, mallory.privateKey)], reviewers, digest);
    expect([good.signed, good.void_reason, forged.signed, forged.void_reason]).toEqual([true, null, false, 'bad-signature']);
  });
});

describe('the sign-off log', () => {
  it('reads back what it writes, numbered by line, and names a line that is not an entry', () => {
    const first = entry({});
    const text = `${signOffLine(first)}{"number":2,"reviewer":"x"}\n${signOffLine({ ...first, number: 3 })}`;
    const log = parseSignOffLog(text);
    expect(log.entries.map((e) => e.number)).toEqual([1, 3]);
    expect(log.unreadable).toEqual([{ line: 2 }]);
    expect(log.entries[0]).toEqual(first);
  });
});
