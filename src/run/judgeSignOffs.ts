// Each recorded sign-off judged against a memo's content and its config's reviewers: valid, or
// void with the first reason that applies: the reviewer is not listed in the config; the
// sign-off was given on other content (its digest is not the memo's); the reviewer has a
// public key and the entry carries no signature, or one that does not verify (Ed25519, over
// `signedText`).
import { createPublicKey, verify, type KeyObject } from 'node:crypto';
import type { RecordedSignOff, VoidReason } from '../memo/reviewPart.js';
import { signedText, type SignOffEntry } from './signOffLog.js';

export interface ListedReviewer {
  name: string;
  role?: string;
  /** PEM text of the reviewer's Ed25519 public key. */
  public_key?: string;
}

function publicKey(pem: string): KeyObject | null {
  try {
    const key = createPublicKey(pem);
    return key.asymmetricKeyType === 'ed25519' ? key : null;
  } catch {
    return null;
  }
}

/** True when `signature` (base64) is the Ed25519 signature of the entry by `pem`'s key. */
export function signatureVerifies(entry: SignOffEntry, pem: string): boolean {
  const key = publicKey(pem);
  if (key === null || entry.signature === null) return false;
  return verify(null, Buffer.from(signedText(entry), 'utf8'), key, Buffer.from(entry.signature, 'base64'));
}

export function voidReason(entry: SignOffEntry, reviewers: readonly ListedReviewer[], digest: string): VoidReason | null {
  const listed = reviewers.find((reviewer) => reviewer.name === entry.reviewer);
  if (listed === undefined) return 'not-listed';
  if (entry.digest !== digest) return 'other-content';
  if (listed.public_key === undefined) return null;
  if (entry.signature === null) return 'unsigned';
  return signatureVerifies(entry, listed.public_key) ? null : 'bad-signature';
}

export function judgeSignOffs(entries: readonly SignOffEntry[], reviewers: readonly ListedReviewer[], digest: string): RecordedSignOff[] {
  return entries.map((entry) => {
    const reason = voidReason(entry, reviewers, digest);
    const key = reviewers.find((reviewer) => reviewer.name === entry.reviewer)?.public_key;
    return {
      number: entry.number,
      reviewer: entry.reviewer,
      role: entry.role,
      decision: entry.decision,
      date: entry.date,
      comment: entry.comment,
      resolves: [...entry.resolves],
      signed: reason === null && key !== undefined,
      void_reason: reason,
    };
  });
}
