// What the memo stage says about a consultancy's own templates folder, and when the machine
// stops the PDF printer in a way the user can fix.
import { problem, type InputProblem } from '../base/problem.js';

export const templateMessages = {
  renderFailed(folder: string, detail: string, line: number | undefined): InputProblem {
    return problem(
      'template.render',
      `a template in ${folder} could not be filled in (${detail})${line === undefined ? '' : ` at line ${line} of the template that holds it`}`,
      'use only the fields and helpers the built-in templates use, or remove the template to use the built-in one',
      { file: folder },
    );
  },
  unreadable(file: string, why: string): InputProblem {
    return problem('template.unreadable', `the template cannot be read (${why})`, 'make it a regular file of the templates folder, or remove it to use the built-in one', { file });
  },
  forbidden(file: string, line: number, what: string): InputProblem {
    return problem('template.not-self-contained', `the template would make the memo load or run something (${what})`, 'a memo stands alone: remove scripts, web addresses and stylesheet imports from the template', { file, line });
  },
  unknownPartial(file: string, line: number, name: string, known: readonly string[]): InputProblem {
    return problem('template.unknown-partial', `no partial named ${JSON.stringify(name)}`, `use one of ${known.join(', ')}, or add partials/${name}.hbs`, { file, line });
  },
  unknownHelper(file: string, line: number, name: string): InputProblem {
    return problem('template.unknown-helper', `no helper named ${JSON.stringify(name)}`, 'use only if, unless, each, with and lookup', { file, line });
  },
  badSyntax(file: string, line: number | undefined, detail: string): InputProblem {
    return problem('template.syntax', `not a valid template (${detail})`, 'fix the template, or remove it to use the built-in one', { file, line });
  },
};

/** Where the Chromium path came from, as the user would set it. */
export type ChromiumSource = 'option' | 'environment' | 'default';

const LEAVE_OUT_PDF = 'or, for run, leave the PDF out (--formats html,json,csv, or output.formats in the config)';

export const printMessages = {
  browserMissing(path: string, source: ChromiumSource, why: string): InputProblem {
    const setBy = source === 'environment' ? ' (set by TRENDBRIEF_CHROMIUM)' : source === 'option' ? '' : ' (the default place)';
    return problem(
      'print.no-browser',
      `no Chromium to print the PDF: ${path}${setBy} ${why}`,
      `install Debian's chromium (apt-get install chromium), point TRENDBRIEF_CHROMIUM at a Chromium or Chrome binary, ${LEAVE_OUT_PDF}`,
    );
  },
  browserFailed(path: string, detail: string): InputProblem {
    return problem(
      'print.browser-failed',
      `Chromium at ${path} did not start to print the PDF (${detail})`,
      `check that it runs (${path} --headless --version), point TRENDBRIEF_CHROMIUM at another Chromium, ${LEAVE_OUT_PDF}`,
    );
  },
  temporaryUnusable(folder: string, code: string): InputProblem {
    return problem(
      'print.temporary-folder',
      `the temporary folder ${folder} cannot take the browser's files for the PDF (${code})`,
      'set TMPDIR to a writable folder with free space, or leave the PDF out (--formats html,json,csv)',
    );
  },
};
