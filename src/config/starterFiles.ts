// The files `trendbrief init` writes: a commented starter config, the config's JSON Schema beside
// it (so the editor hint on the first line works without knowing where trendbrief is installed),
// and an invented example series the config points at.
import { exampleSeriesCsv } from './exampleSeries.js';
import { configSchemaText } from './toJsonSchema.js';

export const STARTER_CONFIG = 'memo.yaml';
export const STARTER_SCHEMA = 'config.schema.json';
export const STARTER_SERIES = 'data/annual-boardings.csv';

const CONFIG_TEXT = `# yaml-language-server: $schema=./${STARTER_SCHEMA}
# A starter trendbrief config; check it with:  trendbrief check ${STARTER_CONFIG}
# Editors that read the line above complete and check every key as you type;
# ${STARTER_SCHEMA} describes each key, its range and its default.
# The organisation and its figures are invented.

memo:
  id: ferry-boardings-outlook        # lowercase, digits and hyphens; names the output folder
  title: Ferry boardings outlook
  client: Fenwick Vale Ferry Trust
  prepared_by: Forecasting desk
  reference: FV-2026-01
  as_of: 2025                        # a period: 2025, 2025-Q4 or 2025-12
  author: A. Analyst
  reviewers:
    - name: R. Reviewer
      role: engagement lead
  # Reviewers record their decisions on the written memo folder, each bound to its numbers:
  #   trendbrief review out/ferry-boardings-outlook/2025 --reviewer 'R. Reviewer' --decision approve
  # (approve, approve-with-changes or return; the last two need --comment). To sign with a key,
  # run trendbrief review --new-key DIR and paste the public key here under public_key: |

# Settings for every series; a series may override any of them. Keys left out take their
# built-in default, and the memo's assumptions register says which is which.
#   through (the last period to forecast: 2030, 2030-Q4 or 2030-12; by default the end of the
#   calendar year 5 years after the last observation for annual data, 2 years after it for
#   monthly and quarterly data) or horizon (steps instead), transform (none | log | {box_cox: 0.5}),
#   levels ([80, 95]), coefficient_uncertainty (true), point (median | mean),
#   estimation (reml | ml: how the chosen order's coefficients are estimated),
#   seasonal (auto | none | {harmonics, seasonal_ar, seasonal_ma, seasonal_differences}),
#   max_p and max_q (3), significance (0.05), missing (error | allow),
#   backtest: {origins (20), horizon (the forecast horizon where the series allows),
#              refit (reselect | reestimate | fixed),
#              window (expanding | sliding), min_train (max(20, 3 × (max_p + max_q + 3)))}
#   recommendation: {rule, significance (0.05), scored_level (the widest of levels),
#                    model (deterministic | stochastic),
#                    justification (required when model is given)}
defaults:
  through: 2030                      # forecast the years 2026 to 2030
  transform: log

series:
  - id: annual-boardings
    title: Annual boardings
    units: thousand boardings
    file: ${STARTER_SERIES}           # relative to this file
    period_column: year
    column: boardings
    frequency: annual
    notes: Invented figures for a fictional ferry service.

output:
  folder: out                        # relative to this file; the memo goes to out/<memo id>/
  formats: [html, pdf, json, csv]
  paper: A4
`;

export interface StarterFile {
  /** Relative to the folder init writes into, with forward slashes. */
  path: string;
  content: string;
}

export function starterFiles(): StarterFile[] {
  return [
    { path: STARTER_CONFIG, content: CONFIG_TEXT },
    { path: STARTER_SCHEMA, content: configSchemaText() },
    { path: STARTER_SERIES, content: exampleSeriesCsv() },
  ];
}
