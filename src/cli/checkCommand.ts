// `trendbrief check CONFIG...`: validates each config and reads every series file it names with
// the checks the run would make (enough observations for the order limits, values the transform
// accepts), without fitting. Every config is checked even when an earlier one fails.
import { loadConfig } from '../config/loadConfig.js';
import type { RunPlan } from '../config/runPlan.js';
import type { Series } from '../base/series.js';
import { readAllSeries } from '../run/readPlannedSeries.js';
import { preflightWarnings } from '../run/preflight.js';
import { formatProblem, InputError, type InputProblem } from '../base/problem.js';
import { configCommandMessages } from './messages.js';
import { splitOptions } from './splitOptions.js';
import { EXIT } from './exitCodes.js';

export const CHECK_HELP = `Usage: trendbrief check CONFIG.yaml...

Checks each config and every series file it names, as a run would, without fitting any model.
Prints one line per config that passes and every problem of those that do not. Warns (on
stderr, one line each) about what the run will do but the memo will be weaker for: a history
too short for a backtest or for enough origins, a horizon beyond what the backtest can score
or longer than half the history, data ending well before memo.as_of, and a clear seasonal
pattern under seasonal: none. Exit code 0 when all pass, warnings or not; 2 otherwise.

Options:
  -h, --help                this text
`;

interface Io {
  stdout(text: string): void;
  stderr(text: string): void;
}

function describeSeries(id: string, series: Series): string {
  return `${id} ${series.first} to ${series.last} (${series.n} ${series.frequency})`;
}

/** The OK line with any warnings (data ending well before memo.as_of), or every problem of the config and its series files. */
async function checkOne(file: string): Promise<{ ok: string; warnings: InputProblem[] } | { problems: readonly InputProblem[] }> {
  let plan: RunPlan;
  try {
    plan = loadConfig(file);
  } catch (error) {
    if (error instanceof InputError) return { problems: error.problems };
    throw error;
  }
  let described: string[];
  const warnings: InputProblem[] = [];
  try {
    described = (await readAllSeries(plan)).map((planned) => {
      if (planned.asOfGap !== undefined) warnings.push(planned.asOfGap.warning);
      warnings.push(...preflightWarnings(planned, plan.configFile));
      return describeSeries(planned.plan.id, planned.series);
    });
  } catch (error) {
    if (error instanceof InputError) return { problems: error.problems };
    throw error;
  }
  const count = plan.series.length === 1 ? '1 series' : `${plan.series.length} series`;
  return { ok: `${file}: ok, memo ${plan.memo.id}, ${count}: ${described.join('; ')}`, warnings };
}

export async function runCheck(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals, problems } = splitOptions(args, { help: { type: 'boolean', short: 'h' } }, 'check');
  if (values.get('help') === true) {
    io.stdout(CHECK_HELP);
    return EXIT.ok;
  }
  if (positionals.length === 0) problems.push(configCommandMessages.noConfigs());
  if (problems.length > 0) throw new InputError(problems);
  let failed = false;
  for (const file of positionals) {
    const result = await checkOne(file);
    if ('ok' in result) {
      for (const warning of result.warnings) io.stderr(`${formatProblem(warning)}\n`);
      io.stdout(`${result.ok}\n`);
      continue;
    }
    failed = true;
    for (const problem of result.problems) io.stderr(`${formatProblem(problem)}\n`);
  }
  return failed ? EXIT.input : EXIT.ok;
}
