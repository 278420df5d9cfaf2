// The whole config file as one spec: memo details, shared settings, the series, the output.
import { FREQUENCIES } from '../base/period.js';
import { choice, list, object, period, text, type ValueOf } from './keySpec.js';
import { DEFAULTS_SPEC, SETTINGS_FIELDS } from './settingsSpec.js';

export const MAX_SERIES = 200;
export const OUTPUT_FORMATS = ['html', 'pdf', 'json', 'csv', 'xlsx'] as const;
/** What a config that names no formats gets: the forecasts workbook (xlsx) is asked for by name. */
export const DEFAULT_OUTPUT_FORMATS = ['html', 'pdf', 'json', 'csv'] as const;
export const DEFAULT_OUTPUT_FOLDER = 'out';

const slug = (doc: string) => text(`${doc} Lowercase letters, digits and single hyphens.`, { form: 'slug', maxLength: 64 });
const path = (doc: string, options: { default?: string; defaultText?: string } = {}) => text(doc, { maxLength: 1000, ...options });

const reviewer = object(
  'A person who reviews the memo.',
  {
    name: text('Full name, as it appears on the sign-off.'),
    role: text('Role, e.g. engagement lead.'),
    public_key: text(
      "The reviewer's Ed25519 public key in PEM form (trendbrief review --new-key writes one); when set, the reviewer's recorded sign-offs count only when signed with the matching private key.",
      { form: 'block', maxLength: 1000 },
    ),
  },
  { required: ['name'], example: '{name: Ada Quill, role: engagement lead}' },
);

const signOff = object(
  "One reviewer's decision on the memo.",
  {
    reviewer: text('Name of a reviewer listed under memo.reviewers.'),
    date: text('Date of the decision.', { form: 'date', maxLength: 10 }),
    decision: choice('The decision.', ['approved', 'approved-with-changes', 'rejected']),
    comment: text('What the reviewer asked for or noted.', { form: 'block' }),
  },
  { required: ['reviewer', 'date', 'decision'], example: '{reviewer: Ada Quill, date: 2026-10-05, decision: approved}' },
);

const memo = object(
  'Who the memo is for and who stands behind it.',
  {
    id: slug('Identifier of the memo; names its output folder.'),
    title: text('Title printed on the memo.'),
    client: text('Organisation the memo is written for.'),
    prepared_by: text('Team or firm that prepared the memo.'),
    reference: text('Engagement or document reference.'),
    as_of: period('Period the memo speaks as of.'),
    author: text('Analyst who wrote the memo.'),
    reviewers: list('People who review the memo.', reviewer, { maxItems: 20, example: '[{name: Ada Quill, role: engagement lead}]' }),
    sign_off: list("Reviewers' decisions typed into the config, each by a listed reviewer: shown as declared, not recorded; they never sign a memo off (trendbrief review records a decision).", signOff, {
      maxItems: 50,
      example: '[{reviewer: Ada Quill, date: 2026-10-05, decision: approved}]',
    }),
  },
  { required: ['id', 'title'], example: '{id: water-demand-2026, title: Water demand outlook}' },
);

/** The frequency of a series, also read by the command line's --frequency. */
export const FREQUENCY = choice('Frequency of the series.', FREQUENCIES, { defaultText: 'read from the period labels' });

/** How a series file's cells and decimals are written, also read by fit's --delimiter and --decimal-mark. */
export const DELIMITER = choice('What separates the cells of a CSV file; auto reads it from the header line and refuses a file that could be read with two.', ['auto', 'comma', 'semicolon', 'tab'], { default: 'auto' });
export const DECIMAL_MARK = choice(
  'The decimal mark of values written as text (1234.5 or 1234,5); auto reads it from the values and refuses a column that could be read both ways. Thousands separators are never read.',
  ['auto', 'point', 'comma'],
  { default: 'auto' },
);

const seriesEntry = object(
  'One series to forecast; any key of defaults may be overridden here.',
  {
    id: slug('Identifier of the series, unique in this config.'),
    title: text('Title of the series in the memo.', { defaultText: 'the id' }),
    units: text('Units of the values, e.g. megalitres per day.'),
    file: path('CSV file or .xlsx workbook holding the series, relative to this config file.'),
    sheet: text('Sheet of the workbook holding the series.', { defaultText: 'the first sheet' }),
    delimiter: DELIMITER,
    decimal_mark: DECIMAL_MARK,
    period_column: text('Column holding the period labels.', { defaultText: 'the first column' }),
    column: text('Column holding the values.', { defaultText: 'the first column after the period column' }),
    frequency: FREQUENCY,
    notes: text('Notes printed with the series.', { form: 'block' }),
    source: text('Where the data come from (publisher, table or system), printed on page 1 and the series page.'),
    vintage: text('Which release of the data this is (a publication or extraction date), printed on page 1.'),
    ...SETTINGS_FIELDS,
  },
  { required: ['id', 'file'], example: '{id: daily-demand, file: data/daily-demand.csv}' },
);

const output = object(
  'Where and in which forms the memo is written.',
  {
    folder: path('Folder the memo folder is written into, relative to this config file.', { default: DEFAULT_OUTPUT_FOLDER }),
    formats: list('Files to produce: html (memo.html), pdf (memo.pdf), json (record.json), csv (forecasts.csv), xlsx (forecasts.xlsx, a workbook of the forecasts for the client).', choice('An output format.', OUTPUT_FORMATS), {
      minItems: 1,
      maxItems: OUTPUT_FORMATS.length,
      unique: true,
      example: '[html, pdf]',
      default: DEFAULT_OUTPUT_FORMATS,
    }),
    paper: choice('Paper size of the PDF.', ['A4', 'Letter'], { default: 'A4' }),
    templates: path('Folder of templates that replace the built-in ones, relative to this config file.', {
      defaultText: 'the built-in templates',
    }),
  },
  { example: '{folder: out, formats: [html, pdf]}' },
);

export const CONFIG_SPEC = object(
  'A trendbrief config: one memo comparing deterministic and stochastic trend forecasts for its series.',
  {
    memo,
    defaults: DEFAULTS_SPEC,
    series: list('The series the memo covers.', seriesEntry, { minItems: 1, maxItems: MAX_SERIES, example: '[{id: daily-demand, file: data/daily-demand.csv}]' }),
    output,
  },
  { required: ['memo', 'series'], example: '{memo: {...}, series: [...]}' },
);

/** A config that passed validation, keys as written in YAML. */
export type ConfigDocument = ValueOf<typeof CONFIG_SPEC>;
export type SeriesEntry = ConfigDocument['series'][number];
export type SettingsEntry = ValueOf<typeof DEFAULTS_SPEC>;

/**
 * What validation returns when some values failed: each failed key is absent and each failed
 * list item undefined, everything else as in a valid config.
 */
export type Loose<T> = T extends readonly (infer U)[] ? (Loose<U> | undefined)[] : T extends object ? { [K in keyof T]?: Loose<T[K]> } : T;
