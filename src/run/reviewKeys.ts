// Reviewers' Ed25519 keys (RFC 8032), with node:crypto only: a key pair written as PEM files
// (the private key PKCS #8, readable by its owner alone; the public key SPKI, to paste into the
// config under memo.reviewers[].public_key), a private key read back for `review --key`, and
// the signature of a sign-off entry.
import { createPrivateKey, createPublicKey, generateKeyPairSync, sign, type KeyObject } from 'node:crypto';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { regularFileBytes } from '../base/readRegularFile.js';
import { join } from 'node:path';
import { InputError } from '../base/problem.js';
import { shownPath } from '../base/shownPath.js';
import { reviewMessages } from './messages.js';
import { signedText, type SignOffEntry } from './signOffLog.js';

export const PRIVATE_KEY_FILE = 'review-key.pem';
export const PUBLIC_KEY_FILE = 'review-key.pub.pem';

/** Largest key file read: an Ed25519 PEM is about 120 bytes. */
const MAX_KEY_BYTES = 64 * 1024;

export interface KeyPairFiles {
  privateFile: string;
  publicFile: string;
  publicPem: string;
}

/** Writes a new key pair into `folder` (created if needed); never overwrites a file. */
export function writeKeyPair(folder: string): KeyPairFiles {
  const { publicKey, privateKey } = generateKeyPairSync('ed25519', {
    publicKeyEncoding: { type: 'spki', format: 'pem' },
    privateKeyEncoding: { type: 'pkcs8', format: 'pem' },
  });
  const privateFile = join(folder, PRIVATE_KEY_FILE);
  const publicFile = join(folder, PUBLIC_KEY_FILE);
  const written: string[] = [];
  try {
    mkdirSync(folder, { recursive: true });
    writeFileSync(privateFile, privateKey, { flag: 'wx', mode: 0o600 });
    written.push(privateFile);
    writeFileSync(publicFile, publicKey, { flag: 'wx', mode: 0o644 });
  } catch (error) {
    for (const file of written) rmSync(file, { force: true });
    const code = error instanceof Error && 'code' in error ? String(error.code) : '';
    if (code === 'EEXIST') throw new InputError(reviewMessages.keyFileExists(shownPath(written.length === 0 ? privateFile : publicFile)));
    if (code !== '') throw new InputError(reviewMessages.keyFolderUnwritable(shownPath(folder), code));
    throw error;
  }
  return { privateFile, publicFile, publicPem: publicKey };
}

/** An Ed25519 private key from a PEM file; refused (exit 2) when it is anything else. */
export function readPrivateKey(file: string): KeyObject {
  try {
    // Only a regular file within the bound is read: a FIFO or /dev/zero named as the key never makes review wait.
    const text = regularFileBytes(file, MAX_KEY_BYTES);
    if (text === null) throw new Error('not a regular file within the bound');
    const key = createPrivateKey(text);
    if (key.asymmetricKeyType === 'ed25519') return key;
  } catch {
    // Unreadable, too large or not a private key: one message for all.
  }
  throw new InputError(reviewMessages.badKey(shownPath(file)));
}

/** True when the private key is the one whose public half is `publicPem`. */
export function keyMatches(privateKey: KeyObject, publicPem: string): boolean {
  const own = createPublicKey(privateKey).export({ type: 'spki', format: 'der' });
  return own.equals(createPublicKey(publicPem).export({ type: 'spki', format: 'der' }));
}

/** Base64 Ed25519 signature of the entry's signed text. */
export function signEntry(entry: Omit<SignOffEntry, 'signature'>, privateKey: KeyObject): string {
  return sign(null, Buffer.from(signedText(entry), 'utf8'), privateKey).toString('base64');
}
