// One config → one memo folder:
//   loadConfig ─▶ RunPlan ─readSeriesCsv (every series, all problems at once)─▶ Series[]
//   ─completeAnalysis─▶ AnalysisRecord[] ─▶ MemoInput ─renderMemoHtml / printer─▶ files
//   ─writeOutputFolder─▶ out/<memo id>/ (complete, or the previous folder left as it was)
import { basename } from 'node:path';
import type { AnalysisRecord } from '../analysis/record.js';
import { toolVersion } from '../analysis/toolVersion.js';
import { loadConfig, type OutputFormat, type RunPlan, type SeriesPlan } from '../config/index.js';
import type { Series } from '../data/series.js';
import { InputError, type InputProblem } from '../errors.js';
import type { MemoInput } from '../memo/memoInput.js';
import { renderMemoHtml } from '../memo/renderMemoHtml.js';
import type { PdfPrinter } from '../memo/print/pdfPrinter.js';
import { analysePlannedSeries, type SeriesTask } from './analysePlannedSeries.js';
import { assumptionsRegister } from './assumptionsRegister.js';
import type { SeriesPool } from './seriesPool.js';
import { checkRunPaths, writeFailure } from './checkRunPaths.js';
import { forecastsCsv } from './forecastsCsv.js';
import { readPlannedSeries } from './readPlannedSeries.js';
import { buildManifest } from './manifest.js';
import { runDate } from './runDate.js';
import { writeOutputFolder, type OutputFile } from './writeOutputFolder.js';

export interface RunMemoOptions {
  /** Replaces the config's output folder (already resolved by the caller). */
  outputFolder?: string;
  /** Replaces the config's formats. */
  formats?: readonly OutputFormat[];
  /** A browser to print with; needed when the formats include pdf. */
  printer?: () => Promise<PdfPrinter>;
  /** The command as the user would type it, for the reproducibility appendix. */
  command: string;
  /** Worker threads for each series' backtest (without a pool). */
  threads?: number;
  /** Worker threads that analyse whole series; shared by every memo of a batch. */
  pool?: SeriesPool;
  /** Called as each series finishes, for progress reports. */
  onSeriesDone?: (memoId: string, seriesId: string) => void;
}

export interface MemoRunResult {
  configFile: string;
  memoId: string;
  folder: string;
  series: number;
  files: string[];
}

export async function runMemo(configFile: string, options: RunMemoOptions): Promise<MemoRunResult> {
  const plan = loadConfig(configFile);
  const paths = checkRunPaths(plan, options.outputFolder);
  const date = runDate();
  const loaded = readAllSeries(plan);
  const records: AnalysisRecord[] = [];
  // Series are independent: on a pool they run side by side, and their order is kept.
  const analyse = options.pool?.analyse ?? ((task: SeriesTask) => analysePlannedSeries({ ...task, threads: options.threads }));
  records.push(
    ...(await Promise.all(
      loaded.map(async ({ plan: seriesPlan, series }) => {
        const record = await analyse({ plan: seriesPlan, series });
        options.onSeriesDone?.(plan.memo.id, seriesPlan.id);
        return record;
      }),
    )),
  );
  const formats = options.formats ?? plan.output.formats;
  const configName = basename(plan.configFile);
  const input: MemoInput = {
    memo: {
      id: plan.memo.id,
      title: plan.memo.title,
      client: plan.memo.client ?? '',
      prepared_by: plan.memo.preparedBy ?? '',
      reference: plan.memo.reference ?? '',
      as_of: plan.memo.asOf ?? '',
      author: plan.memo.author ?? '',
      reviewers: plan.memo.reviewers.map((reviewer) => ({ name: reviewer.name, role: reviewer.role ?? '' })),
      sign_off: plan.memo.signOff.map((entry) => ({ ...entry })),
    },
    paper: plan.output.paper,
    series: loaded.map(({ plan: seriesPlan, series }, i) => ({
      record: records[i],
      history: series.periods.map((period, t) => ({ period, value: Number.isFinite(series.values[t]) ? series.values[t] : null })),
      units: seriesPlan.units,
      notes: seriesPlan.notes,
      assumptions: assumptionsRegister(seriesPlan, records[i], configName),
    })),
    reproducibility: {
      tool: toolVersion().name,
      version: toolVersion().version,
      command: options.command,
      run_date: date,
      config: { file: configName, sha256: plan.configSha256 },
      data: loaded.map(({ plan: seriesPlan, series }) => ({ file: seriesPlan.fileAsWritten, sha256: series.sha256 })),
    },
  };
  const files: OutputFile[] = [];
  const html = await renderMemoHtml(input, { templatesDir: plan.output.templates?.folder });
  if (formats.includes('html')) files.push({ name: 'memo.html', content: html });
  if (formats.includes('pdf')) {
    if (options.printer === undefined) throw new Error('runMemo: pdf output needs a printer');
    const printer = await options.printer();
    files.push({ name: 'memo.pdf', content: await printer.print(html, { paper: plan.output.paper, footer: plan.memo.reference ?? plan.memo.title }) });
  }
  if (formats.includes('json')) {
    const document = { schema: 'trendbrief.memo/1', memo: input.memo, run_date: date, records };
    files.push({ name: 'record.json', content: `${JSON.stringify(document, null, 2)}\n` });
  }
  if (formats.includes('csv')) files.push({ name: 'forecasts.csv', content: forecastsCsv(records) });
  const manifest = buildManifest(
    {
      tool: toolVersion(),
      run_date: date,
      command: options.command,
      inputs: [
        { role: 'config', path: configName, sha256: plan.configSha256 },
        ...loaded.map(({ plan: seriesPlan, series }) => ({ role: 'data' as const, path: seriesPlan.fileAsWritten, sha256: series.sha256 })),
      ],
    },
    files,
  );
  files.push({ name: 'manifest.json', content: `${JSON.stringify(manifest, null, 2)}\n` });
  try {
    writeOutputFolder(paths.memoFolder, files);
  } catch (error) {
    throw writeFailure(error, paths);
  }
  return { configFile: plan.configFile, memoId: plan.memo.id, folder: paths.memoFolder, series: records.length, files: files.map((file) => file.name) };
}

/** Reads every series file, collecting the problems of all of them before failing. */
function readAllSeries(plan: RunPlan): { plan: SeriesPlan; series: Series }[] {
  const problems: InputProblem[] = [];
  const loaded: { plan: SeriesPlan; series: Series }[] = [];
  for (const seriesPlan of plan.series) {
    try {
      loaded.push({ plan: seriesPlan, series: readPlannedSeries(seriesPlan, plan.configFile) });
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      problems.push(...error.problems);
    }
  }
  if (problems.length > 0) throw new InputError(problems);
  return loaded;
}

