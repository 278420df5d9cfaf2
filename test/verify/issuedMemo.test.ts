// Recorded sign-offs and issued memos end to end (our spec: DEVELOPERS.md, "Self-contained memo folders, sign-offs, issued
// memos and revisions"): a sign-off is bound to the content digest; verify reports it valid; a
// rerun with the same content keeps it; a rerun that would change an issued memo is refused
// and changes no byte; with --new-revision the earlier memo is kept as revisions/1 and its
// sign-off is void against the new content.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Manifest } from '../../src/run/manifest.js';
import { runCli } from '../support/runCli.js';
import { fixRunDate, monthlyFolder, readText, reviseData } from '../run/monthlySetup.js';

fixRunDate();

/** Every file under `folder` with its bytes, by path relative to it. */
function snapshot(folder: string, prefix = ''): Map<string, string> {
  const files = new Map<string, string>();
  for (const name of readdirSync(join(folder, prefix)).sort()) {
    const path = join(prefix, name);
    if (statSync(join(folder, path)).isDirectory()) for (const [key, value] of snapshot(folder, path)) files.set(key, value);
    else files.set(path, readFileSync(join(folder, path)).toString('base64'));
  }
  return files;
}

const sha = (content: string | Buffer) => createHash('sha256').update(content).digest('hex');

describe('a sign-off on an issued memo', () => {
  it('is bound to the digest, survives an identical rerun, blocks a silent change and is void against a new revision', async () => {
    const root = monthlyFolder('2025-11');
    const config = join(root, 'memo.yaml');
    expect((await runCli(['run', config, '--quiet'])).code).toBe(0);
    const folder = join(root, 'out/lake-outlook/2025-11');
    const manifest = JSON.parse(readText(folder, 'manifest.json')) as Manifest;
    // The digest by its definition (src/run/contentDigest.ts), computed here from the manifest and the stored files.
    const digest = sha(
      [
        'trendbrief content digest 1',
        ...manifest.inputs.map((input) => `input ${input.role} ${JSON.stringify(input.path)} ${input.sha256}`),
        `output record.json ${sha(readFileSync(join(folder, 'record.json')))}`,
        `output forecasts.csv ${sha(readFileSync(join(folder, 'forecasts.csv')))}`,
        '',
      ].join('\n'),
    );
    expect(readText(folder, 'memo.html')).toContain(`<code class="hash">${digest}</code>`);
    const numbers = { record: readText(folder, 'record.json'), csv: readText(folder, 'forecasts.csv') };

    const review = await runCli(['review', folder, '--reviewer', 'A. Reviewer', '--decision', 'approve-with-changes', '--comment', 'Name the gauge in the title.']);
    expect(review.stderr).toBe('');
    expect(review.code).toBe(0);
    expect(review.stdout).toContain(`recorded No. 1: A. Reviewer, approve-with-changes, 2026-01-01 on content digest ${digest}\n`);
    // Re-rendering leaves the numbers byte for byte and the digest as it was.
    expect({ record: readText(folder, 'record.json'), csv: readText(folder, 'forecasts.csv') }).toEqual(numbers);
    const html = readText(folder, 'memo.html');
    expect(html).toContain('Status: Signed off');
    expect(html).toContain(`<code class="hash">${digest}</code>`);
    expect(JSON.parse(readText(folder, 'sign-offs.jsonl'))).toMatchObject({ number: 1, digest, signature: null, comment: 'Name the gauge in the title.' });

    const verified = await runCli(['verify', folder]);
    expect(verified.code).toBe(0);
    expect(verified.stdout).toContain(`content digest: ${digest}\nsign-offs: 1 recorded, 1 valid on this content\n  No. 1 A. Reviewer, approve-with-changes, 2026-01-01: valid\n`);

    const again = await runCli(['run', config]);
    expect(again.code).toBe(0);
    expect(again.stdout).toContain('kept (same content as the issued memo; 1 sign-off carried, nothing changed)');
    expect(readText(folder, 'memo.html')).toBe(html);

    const before = snapshot(folder);
    reviseData(root, '1924', 0.5, 580.1);
    const refused = await runCli(['run', config, '--quiet']);
    expect(refused.code).toBe(2);
    expect(refused.errorLines[0]).toMatch(
      new RegExp(`^${folder}/sign-offs\\.jsonl: the memo in '${folder}' is issued \\(1 sign-off recorded\\) and this run would change its content \\(digest ${digest.slice(0, 12)}… to [0-9a-f]{12}…\\); run again with --new-revision`),
    );
    expect(snapshot(folder)).toEqual(before);

    const revised = await runCli(['run', config, '--new-revision']);
    expect(revised.code).toBe(0);
    expect(revised.stdout).toContain('revised (revision 1 kept; memo.html, record.json, forecasts.csv, supersedes.json, manifest.json)');
    expect(existsSync(join(folder, 'sign-offs.jsonl'))).toBe(false);
    const kept = new Map([...before].map(([name, bytes]) => [join('revisions/1', name), bytes]));
    for (const [name, bytes] of kept) expect(snapshot(folder).get(name)).toBe(bytes);
    const newHtml = readText(folder, 'memo.html');
    expect(newHtml).toContain('Status: Draft');
    expect(newHtml).toContain(`This memo supersedes revision 1 (content digest ${digest.slice(0, 12)}…), because data/lake-huron.csv changed;`);
    const after = sha(readFileSync(join(root, 'data/lake-huron.csv')));
    expect(newHtml).toContain(`The data file data/lake-huron.csv changed (SHA-256 ${manifest.inputs[1].sha256.slice(0, 12)}… before, ${after.slice(0, 12)}… now).`);
    expect(newHtml).toContain('1 observation was revised in periods both versions hold.');
    const supersedes = JSON.parse(readText(folder, 'supersedes.json')) as { revision: number; inputs: { path: string }[]; observations_revised: number };
    // One value revised (1924) and one appended by reviseData.
    expect(supersedes).toMatchObject({ revision: 1, digest, inputs: [{ role: 'data', path: 'data/lake-huron.csv' }], observations_revised: 1 });

    const afterRevision = await runCli(['verify', folder]);
    expect(afterRevision.code).toBe(0);
    expect(afterRevision.stdout).toContain('sign-offs: 1 recorded, 0 valid on this content\n');
    expect(afterRevision.stdout).toMatch(
      new RegExp(`\n {2}revision 1, No\\. 1 A\\. Reviewer, approve-with-changes, 2026-01-01: void \\(given on content digest ${digest.slice(0, 12)}…, this memo's is [0-9a-f]{12}…\\)\n`),
    );
    // The kept revision verifies on its own, from its own copies, with its sign-off valid there.
    const oldRevision = await runCli(['verify', join(folder, 'revisions/1')]);
    expect(oldRevision.code).toBe(0);
    expect(oldRevision.stdout).toContain('  No. 1 A. Reviewer, approve-with-changes, 2026-01-01: valid\n');
    const superseded = await runCli(['review', join(folder, 'revisions/1'), '--reviewer', 'A. Reviewer', '--decision', 'approve']);
    expect([superseded.code, superseded.errorLines]).toEqual([
      2,
      [`${folder}/revisions/1: '${folder}/revisions/1' is a revision kept by the memo in '${folder}', which supersedes it; review the current memo, ${folder}`],
    ]);
  });
});
