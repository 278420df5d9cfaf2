// `trendbrief review MEMO_FOLDER --reviewer NAME --decision DECISION [--comment TEXT]
// [--date YYYY-MM-DD] [--resolves N,N] [--key FILE]`: records one reviewer's decision on a memo
// folder (src/run/recordSignOff.ts). `trendbrief review --new-key DIR` writes a reviewer's
// Ed25519 key pair. Every problem exits with 2 and changes nothing.
import { DATE_PATTERN, firstRefusedCharacter, isCalendarDay } from '../base/textPatterns.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { configMessages } from '../config/messages.js';
import type { ReviewDecision } from '../memo/reviewPart.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { reviewMessages } from '../run/messages.js';
import { recordSignOff } from '../run/recordSignOff.js';
import { writeKeyPair } from '../run/reviewKeys.js';
import { runDate } from '../run/runDate.js';
import { REVIEW_DECISIONS } from '../run/signOffLog.js';
import { shownPath } from '../base/shownPath.js';
import { EXIT } from './exitCodes.js';
import { splitOptions } from './splitOptions.js';

export const REVIEW_HELP = `Usage: trendbrief review MEMO_FOLDER --reviewer NAME --decision DECISION [options]
       trendbrief review --new-key DIR

Records one reviewer's decision on a memo folder written by trendbrief run. The decision is
bound to the memo's content digest (its inputs, record.json and forecasts.csv): a later change
to any of them voids it. The sign-off is appended to the folder's sign-offs.jsonl, and memo.html
(and memo.pdf) are rendered again with the new status; the numbers are not touched. A memo is
issued once a reviewer's decision is recorded on it.

Options:
  --reviewer NAME        a reviewer listed under memo.reviewers in the memo's config
  --decision DECISION    ${REVIEW_DECISIONS.join(', ')}
  --comment TEXT         what must change or was noted; needed for approve-with-changes and return
  --date YYYY-MM-DD      the date of the decision (default: SOURCE_DATE_EPOCH's day, else today, UTC)
  --resolves N,N         numbers of open comments (from earlier approvals with changes) this resolves
  --key FILE             the reviewer's Ed25519 private key; needed when the config lists a
                         public_key for the reviewer, whose sign-offs count only when signed
  --new-key DIR          write a new key pair into DIR (review-key.pem, kept by the reviewer,
                         and review-key.pub.pem, whose text goes under the reviewer's public_key)
  -h, --help             this text
`;

/** A comment's longest length in code points: the config's limit for multi-line text. */
const MAX_COMMENT = 4000;

interface Io {
  stdout(text: string): void;
  stderr(text: string): void;
}

function parseDecision(value: string | true | undefined, problems: InputProblem[]): ReviewDecision | undefined {
  if (value === undefined) {
    problems.push(reviewMessages.missingOption('--decision', REVIEW_DECISIONS[0]));
    return undefined;
  }
  const found = REVIEW_DECISIONS.find((decision) => decision === value);
  if (found === undefined) problems.push(reviewMessages.badDecision(value === true ? '' : value, REVIEW_DECISIONS));
  return found;
}

function parseResolves(value: string | true | undefined, problems: InputProblem[]): number[] {
  if (value === undefined) return [];
  const text = value === true ? '' : value;
  const parts = text.split(',').map((part) => part.trim());
  if (!parts.every((part) => /^[1-9]\d{0,6}$/.test(part))) {
    problems.push(reviewMessages.badResolves(text));
    return [];
  }
  return [...new Set(parts.map(Number))];
}

function parseDate(value: string | true | undefined, problems: InputProblem[]): string {
  if (value === undefined) return runDate();
  const text = value === true ? '' : value;
  if (!new RegExp(DATE_PATTERN).test(text) || !isCalendarDay(text)) problems.push(reviewMessages.badDate(text));
  return text;
}

export async function runReview(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals, problems } = splitOptions(
    args,
    {
      reviewer: { type: 'string' },
      decision: { type: 'string' },
      comment: { type: 'string' },
      date: { type: 'string' },
      resolves: { type: 'string' },
      key: { type: 'string' },
      'new-key': { type: 'string' },
      help: { type: 'boolean', short: 'h' },
    },
    'review',
  );
  if (values.get('help') === true) {
    io.stdout(REVIEW_HELP);
    return EXIT.ok;
  }
  const newKey = values.get('new-key');
  if (typeof newKey === 'string') {
    if (positionals.length > 0 || ['reviewer', 'decision', 'comment', 'resolves', 'key'].some((name) => values.has(name))) problems.push(reviewMessages.newKeyWithDecision());
    if (problems.length > 0) throw new InputError(problems);
    const pair = writeKeyPair(newKey);
    io.stdout(
      `wrote ${shownPath(pair.privateFile)} (the private key: keep it to yourself) and ${shownPath(pair.publicFile)}\n` +
        `add the public key to your entry under memo.reviewers:\n    public_key: |\n${pair.publicPem.trimEnd().replace(/^/gm, '      ')}\n`,
    );
    return EXIT.ok;
  }
  if (positionals.length === 0) problems.push(reviewMessages.noFolder());
  if (positionals.length > 1) problems.push(reviewMessages.extraArguments(positionals.slice(1)));
  const reviewer = values.get('reviewer');
  if (typeof reviewer !== 'string' || reviewer.trim() === '') problems.push(reviewMessages.missingOption('--reviewer', "'A. Reviewer'"));
  const decision = parseDecision(values.get('decision'), problems);
  const commentValue = values.get('comment');
  const comment = typeof commentValue === 'string' ? commentValue.trim() : '';
  if (decision !== undefined && decision !== 'approve' && comment === '') problems.push(reviewMessages.commentNeeded(decision));
  // The comment reaches the memo: the config's rules for multi-line text apply (src/base/textPatterns.ts).
  const refused = firstRefusedCharacter(comment, 'block');
  if (refused !== undefined) problems.push(configMessages.controlCharacter({ field: '--comment' }, refused.codePoint, refused.position, true));
  if ([...comment].length > MAX_COMMENT) problems.push(reviewMessages.commentTooLong([...comment].length, MAX_COMMENT));
  const date = parseDate(values.get('date'), problems);
  const resolves = parseResolves(values.get('resolves'), problems);
  const key = values.get('key');
  if (problems.length > 0 || decision === undefined || typeof reviewer !== 'string') throw new InputError(problems);
  let printer: Promise<PdfPrinter> | undefined;
  try {
    const result = await recordSignOff({
      folder: positionals[0],
      reviewer: reviewer.trim(),
      decision,
      comment,
      date,
      resolves,
      keyFile: typeof key === 'string' ? key : undefined,
      // The browser starts only when the folder holds a PDF to print again.
      printer: () => (printer ??= import('../memo/print/pdfPrinter.js').then(({ openPdfPrinter }) => openPdfPrinter())),
    });
    const { entry, status } = result;
    io.stdout(
      `recorded No. ${entry.number}: ${entry.reviewer}, ${entry.decision}, ${entry.date}${entry.signature === null ? '' : ', signed'} on content digest ${entry.digest}\n` +
        `${positionals[0]}: ${status.label}. ${status.detail} (changed: ${result.files.join(', ')}; the numbers are as they were)\n`,
    );
    return EXIT.ok;
  } finally {
    if (printer !== undefined) await (await printer).close();
  }
}
