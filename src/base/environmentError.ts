// A problem with the machine rather than with the user's input or our code: a program the tool
// needs (the Chromium that prints the PDF) is missing or does not start. It is an InputError,
// so every path that reports input problems reports it in the same one-line form; the command
// line tells it apart to exit with its own code (4, cli/exitCodes.ts) and to report it once per
// run however many memos it stopped.
import { InputError, type InputProblem } from './problem.js';

export class EnvironmentError extends InputError {
  constructor(problem: InputProblem) {
    super(problem);
    this.name = 'EnvironmentError';
  }
}
