// Only a regular file is read, and nothing makes the read wait: FIFOs, sockets and devices are
// refused without being opened, links only lead to a regular file, and the size bound holds
// (our spec: src/base/readRegularFile.ts). A refused FIFO that were opened blocking would hang
// this test instead of failing it.
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { quotedCell } from '../../src/base/quotedCell.js';
import { readRegularFile } from '../../src/base/readRegularFile.js';
import { firstInvalidUtf8 } from '../../src/base/utf8Position.js';

const root = mkdtempSync(join(tmpdir(), 'tb-regular-'));
const at = (name: string) => join(root, name);

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

describe('readRegularFile', () => {
  it('reads a regular file, also through a symbolic link', () => {
    writeFileSync(at('plain.csv'), 'year,value\n');
    symlinkSync(at('plain.csv'), at('link.csv'));
    expect(readRegularFile(at('link.csv'), 100)).toEqual({ bytes: Buffer.from('year,value\n') });
  });

  it('refuses a FIFO, a character device and a link to one without opening them', () => {
    execFileSync('mkfifo', [at('pipe')]);
    symlinkSync('/dev/zero', at('zero.csv'));
    for (const file of [at('pipe'), '/dev/zero', at('zero.csv')]) expect(readRegularFile(file, 100)).toEqual({ fault: { kind: 'special file' } });
  });

  it('refuses a socket', async () => {
    const server = createServer();
    await new Promise<void>((done) => server.listen(at('socket'), done));
    try {
      expect(readRegularFile(at('socket'), 100)).toEqual({ fault: { kind: 'special file' } });
    } finally {
      await new Promise((done) => server.close(done));
    }
  });

  it('tells a directory, a missing file, a dangling link, a loop and a name too long apart', () => {
    mkdirSync(at('folder'));
    symlinkSync(at('nowhere.csv'), at('dangling.csv'));
    symlinkSync(at('loop-b'), at('loop-a'));
    symlinkSync(at('loop-a'), at('loop-b'));
    expect(readRegularFile(at('folder'), 100)).toEqual({ fault: { kind: 'directory' } });
    expect(readRegularFile(at('nowhere.csv'), 100)).toEqual({ fault: { kind: 'missing' } });
    expect(readRegularFile(at('dangling.csv'), 100)).toEqual({ fault: { kind: 'dangling-link' } });
    expect(readRegularFile(at('loop-a'), 100)).toEqual({ fault: { kind: 'link-loop' } });
    // Linux allows 255 bytes in one name (NAME_MAX, common practice).
    expect(readRegularFile(at('x'.repeat(300)), 100)).toEqual({ fault: { kind: 'name-too-long' } });
  });

  it('holds the size bound', () => {
    writeFileSync(at('eleven'), 'x'.repeat(11));
    expect(readRegularFile(at('eleven'), 10)).toEqual({ fault: { kind: 'too-large', bytes: 11 } });
    expect(readRegularFile(at('eleven'), 11)).toEqual({ bytes: Buffer.from('x'.repeat(11)) });
  });
});

describe('firstInvalidUtf8', () => {
  it('points at the first byte that is not UTF-8, counting characters', () => {
    // 'é' in Latin-1 is the lone byte 0xE9; 'ü' before it is two UTF-8 bytes and one character.
    expect(firstInvalidUtf8(Buffer.concat([Buffer.from('memo:\n  client: Tüb'), Buffer.from([0xe9])]))).toEqual({ line: 2, column: 14 });
    // An overlong '/' (0xC0 0xAF) is not UTF-8 (RFC 3629, section 10), nor is a surrogate (0xED 0xA0 0x80).
    expect(firstInvalidUtf8(Buffer.from([0x61, 0xc0, 0xaf]))).toEqual({ line: 1, column: 2 });
    expect(firstInvalidUtf8(Buffer.from([0x0a, 0xed, 0xa0, 0x80]))).toEqual({ line: 2, column: 1 });
    // A byte order mark is not a character of the first line.
    expect(firstInvalidUtf8(Buffer.from([0xef, 0xbb, 0xbf, 0x61, 0xff]))).toEqual({ line: 1, column: 2 });
  });
});

describe('quotedCell', () => {
  it('quotes a short cell whole and cuts a long one to 40 characters', () => {
    expect(quotedCell('503 kt')).toBe("'503 kt'");
    const line = 'root:x:0:0:root:/root:/bin/bash,daemon:x:1:1:daemon:/usr/sbin';
    expect(quotedCell(line)).toBe(`'${line.slice(0, 37)}...' (${line.length} characters)`);
  });
});
