// A consultancy's own templates (output.templates) are user input: every fault in them is exit 2
// at the template file and line, never an internal error while the memo renders (our spec).
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError, type InputProblem } from '../../src/base/problem.js';
import { checkHouseTemplate } from '../../src/memo/checkHouseTemplate.js';
import { builtInTemplatesDir } from '../../src/memo/loadTemplates.js';
import { renderMemoHtml } from '../../src/memo/renderMemoHtml.js';
import { sampleInput } from './sampleInput.js';

/** A templates folder holding one partial with `source`, the rest taken from the built-in set. */
function houseFolder(file: string, source: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'tb-house-'));
  mkdirSync(join(dir, 'partials'));
  writeFileSync(join(dir, file), source);
  return dir;
}

async function problemsOf(dir: string): Promise<readonly InputProblem[]> {
  try {
    await renderMemoHtml(sampleInput(['lakeHuron']), { templatesDir: dir });
  } catch (error) {
    if (error instanceof InputError) return error.problems;
    throw error;
  }
  throw new Error('the memo rendered');
}

describe("a consultancy's own templates", () => {
  it('refuse a script, a web address or a stylesheet import at their file and line', async () => {
    const dir = houseFolder('partials/cautions.hbs', '<aside>\n<p>Cautions</p>\n<script>alert(1)</script>\n</aside>\n');
    expect(await problemsOf(dir)).toEqual([expect.objectContaining({ code: 'template.not-self-contained', file: join(dir, 'partials/cautions.hbs'), line: 3 })]);
    const css = houseFolder('memo.css', 'body { color: black; }\n@import url(house.css);\n');
    expect(await problemsOf(css)).toEqual([expect.objectContaining({ code: 'template.not-self-contained', file: join(css, 'memo.css'), line: 2 })]);
  });

  it('refuse a partial or a helper that does not exist, at its line', async () => {
    const partial = houseFolder('partials/cautions.hbs', '<aside>\n{{> letterhead}}\n</aside>\n');
    expect(await problemsOf(partial)).toEqual([expect.objectContaining({ code: 'template.unknown-partial', file: join(partial, 'partials/cautions.hbs'), line: 2 })]);
    const helper = houseFolder('partials/cautions.hbs', '<aside>\n<p>{{shout headings.cautions}}</p>\n</aside>\n');
    expect(await problemsOf(helper)).toEqual([expect.objectContaining({ code: 'template.unknown-helper', line: 2, message: 'no helper named "shout"' })]);
  });

  it('turn a field the view does not have into bad input naming the folder and line', async () => {
    const dir = houseFolder('partials/cautions.hbs', '<aside>\n<p>{{headings.nonesuch.deeper}}</p>\n</aside>\n');
    const [problem] = await problemsOf(dir);
    expect(problem).toMatchObject({ code: 'template.render', file: dir });
    expect(problem.message).toContain('at line 2');
  });

  it('pass the same check when they are copies of the built-in set', () => {
    const dir = builtInTemplatesDir();
    const names = readdirSync(join(dir, 'partials')).map((f) => f.replace(/\.hbs$/, ''));
    for (const file of ['memo.hbs', 'memo.css', ...names.map((name) => `partials/${name}.hbs`)]) {
      expect(() => checkHouseTemplate(join(dir, file), readFileSync(join(dir, file), 'utf8'), names), file).not.toThrow();
    }
  });
});

describe('a template that is not a regular file', () => {
  it('is refused without being opened, so a FIFO cannot hold the run', async () => {
    const { execFileSync } = await import('node:child_process');
    const dir = mkdtempSync(join(tmpdir(), 'tb-house-fifo-'));
    mkdirSync(join(dir, 'partials'));
    execFileSync('mkfifo', [join(dir, 'memo.css')]);
    expect(await problemsOf(dir)).toEqual([expect.objectContaining({ code: 'template.unreadable', file: join(dir, 'memo.css'), message: 'the template cannot be read (special file)' })]);
  });
});
