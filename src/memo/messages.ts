// What the memo stage says about a consultancy's own templates folder, and when the machine
// stops the PDF printer in a way the user can fix.
import { problem, type InputProblem } from '../base/problem.js';

export const templateMessages = {
  badSyntax(file: string, line: number | undefined, detail: string): InputProblem {
    return problem('template.syntax', `not a valid template (${detail})`, 'fix the template, or remove it to use the built-in one', { file, line });
  },
};

export const printMessages = {
  temporaryUnusable(folder: string, code: string): InputProblem {
    return problem(
      'print.temporary-folder',
      `the temporary folder ${folder} cannot take the browser's files for the PDF (${code})`,
      'set TMPDIR to a writable folder with free space, or leave the PDF out (--formats html,json,csv)',
    );
  },
};
