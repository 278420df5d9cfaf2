// Peer benchmark: the same work done by trendbrief and by the general-purpose reference
// libraries that are installed, each as whole processes (start-up included), on the Lake Huron
// series (n = 98). `fit`: trendbrief's `fit` (both models, p, q ≤ 3, the evidence) against each
// peer's 32-candidate order search alone (test/bench/peers/arimaGrid.R and arimaGrid.py: 16
// regressions on [1, t] with ARMA errors, 16 ARIMA(p, 1, q) with drift, exact maximum
// likelihood, lowest AICc kept). `backtest`: trendbrief's 20-origin reselecting backtest at 5
// horizons against each peer redoing the search at the same 20 expanding origins and forecasting
// 5 steps. Medians of 3 runs after one untimed `fit` run of each program (disk caches warm).
// A peer that is not installed gets a row saying so; tests never need the peers.
import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import { median, type BenchRow } from './timing.js';

const REPEATS = 3;
const PROGRAM = resolve('bin/trendbrief.js');
const LAKE_HURON = resolve('test/fixtures/lake-huron.csv');
const MODES = ['fit', 'backtest'] as const;
type Mode = (typeof MODES)[number];

const TRENDBRIEF_ARGS: Record<Mode, string[]> = {
  fit: ['fit', LAKE_HURON],
  backtest: ['fit', LAKE_HURON, '--backtest', '--origins', '20', '--backtest-horizon', '5'],
};
const WORK: Record<Mode, string> = {
  fit: 'fit lake-huron.csv',
  backtest: '20-origin reselecting backtest, 5 horizons, lake-huron.csv',
};
/** The targets: trendbrief's whole process in ms, and how many times faster than each peer. */
const TARGET_MS: Record<Mode, number> = { fit: 150, backtest: 600 };
const TARGET_SPEEDUP: Record<Mode, Partial<Record<PeerKey, number>>> = {
  fit: { r: 2 },
  backtest: { r: 10, statsmodels: 50 },
};

type PeerKey = 'r' | 'statsmodels';
interface Peer {
  key: PeerKey;
  label: string;
  /** The command that runs the peer's script, or undefined when the library is not installed. */
  command: [string, string] | undefined;
  install: string;
}
/** What a peer script prints: the library and version, candidates fitted and those skipped. */
interface PeerReport {
  library: string;
  fits: number;
  failed: number;
}

function timeRun(command: string, args: readonly string[]): number {
  const start = performance.now();
  execFileSync(command, args, { stdio: 'ignore' });
  return performance.now() - start;
}

function timePeer(command: string, script: string, mode: Mode): { ms: number; report: PeerReport } {
  let report: PeerReport | undefined;
  const times = Array.from({ length: REPEATS }, () => {
    const start = performance.now();
    const output = execFileSync(command, [script, LAKE_HURON, mode], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] });
    const ms = performance.now() - start;
    report = JSON.parse(output) as PeerReport;
    return ms;
  });
  if (report === undefined) throw new Error(`peers bench: ${script} printed nothing`);
  return { ms: median(times), report };
}

function works(command: string, args: readonly string[]): boolean {
  try {
    execFileSync(command, args, { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

function findPeers(): Peer[] {
  const script = (name: string): string => resolve('test/bench/peers', name);
  // Debian's python3-statsmodels is in /usr/bin/python3, which another python3 on the PATH may hide.
  const python = ['python3', '/usr/bin/python3'].find((command) => works(command, ['-c', 'import statsmodels']));
  return [
    {
      key: 'r',
      label: 'base R stats::arima',
      command: works('Rscript', ['--version']) ? ['Rscript', script('arimaGrid.R')] : undefined,
      install: 'apt-get install r-base-core',
    },
    {
      key: 'statsmodels',
      label: 'statsmodels ARIMA',
      command: python === undefined ? undefined : [python, script('arimaGrid.py')],
      install: 'apt-get install python3-statsmodels',
    },
  ];
}

export function peersBench(): BenchRow[] {
  const peers = findPeers();
  timeRun(process.execPath, [PROGRAM, ...TRENDBRIEF_ARGS.fit]);
  for (const peer of peers) if (peer.command !== undefined) timeRun(peer.command[0], [peer.command[1], LAKE_HURON, 'fit']);

  const rows: BenchRow[] = [];
  for (const mode of MODES) {
    const trendbrief = median(Array.from({ length: REPEATS }, () => timeRun(process.execPath, [PROGRAM, ...TRENDBRIEF_ARGS[mode]])));
    rows.push({ name: `${mode}: trendbrief ${WORK[mode]}, whole process`, ms: trendbrief, target: TARGET_MS[mode] });
    for (const peer of peers) {
      if (peer.command === undefined) {
        rows.push({ name: `${mode}: ${peer.label} not installed (${peer.install}), not run`, ms: Number.NaN });
        continue;
      }
      const { ms, report } = timePeer(peer.command[0], peer.command[1], mode);
      rows.push({
        name: `${mode}: ${report.library}, ${report.fits} candidate fits${mode === 'backtest' ? ' and 5-step forecasts' : ''}, whole process`,
        ms,
        extra: { 'candidates skipped (no convergence)': report.failed },
      });
      // A speed-up target as a time: trendbrief within the peer's time divided by the factor.
      const speedup = TARGET_SPEEDUP[mode][peer.key];
      const against = `${mode}: trendbrief against ${report.library}`;
      const ratio = { 'peer time ÷ trendbrief time': ms / trendbrief };
      rows.push(
        speedup === undefined
          ? { name: against, ms: trendbrief, extra: ratio }
          : { name: `${against}, target ${speedup}× faster = peer's time ÷ ${speedup}`, ms: trendbrief, target: Math.round(ms / speedup), extra: ratio },
      );
    }
  }
  return rows;
}
