// What the memo stage says about a consultancy's own templates folder.
import { problem, type InputProblem } from '../base/problem.js';

export const templateMessages = {
  badSyntax(file: string, line: number | undefined, detail: string): InputProblem {
    return problem('template.syntax', `not a valid template (${detail})`, 'fix the template, or remove it to use the built-in one', { file, line });
  },
};
