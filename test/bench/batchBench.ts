// Batch benchmarks: the demo memo end to end (HTML and PDF), and a 100-series batch of
// invented annual and quarterly series (n = 40..200, backtests with re-selection) in ten
// configs, once with HTML output and once with PDF. Each run is a child process of the
// compiled tool, so the figures include start-up; peak memory is the child's maximum
// resident set (worker threads included, Chromium's own processes not).
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { timeChild } from './childProcess.js';
import { seededNormals } from '../evidence/seededNormals.js';
import type { BenchRow } from './timing.js';

function writeBatch(root: string): string[] {
  const draw = seededNormals(2026);
  const configs: string[] = [];
  mkdirSync(join(root, 'data'));
  for (let c = 0; c < 10; c++) {
    const entries: string[] = [];
    for (let s = 0; s < 10; s++) {
      const quarterly = (c + s) % 2 === 1;
      const n = 40 + ((c * 10 + s) * 17) % 161;
      const wandering = s % 3 === 0;
      let level = 100;
      let noise = 0;
      const lines = ['period,value'];
      for (let t = 0; t < n; t++) {
        noise = 0.5 * noise + draw();
        level = wandering ? level + 0.3 + noise : 100 + 0.4 * t + 2 * noise;
        const period = quarterly ? `${1970 + Math.floor(t / 4)}-Q${(t % 4) + 1}` : String(1820 + t);
        lines.push(`${period},${level.toFixed(3)}`);
      }
      const file = `data/c${c}s${s}.csv`;
      writeFileSync(join(root, file), `${lines.join('\n')}\n`);
      entries.push(`  - id: s${s}\n    file: ${file}\n    horizon: ${quarterly ? 8 : 10}`);
    }
    const config = `config${c}.yaml`;
    writeFileSync(
      join(root, config),
      `memo:\n  id: batch-${c}\n  title: Invented batch memo ${c}\ndefaults:\n  backtest: {origins: 10, horizon: 4, refit: reselect}\nseries:\n${entries.join('\n')}\noutput:\n  folder: out\n  formats: [html, json, csv]\n`,
    );
    configs.push(config);
  }
  return configs;
}

export function batchBench(): BenchRow[] {
  execFileSync('npm', ['run', 'build'], { stdio: 'ignore' });
  const rows: BenchRow[] = [];
  const demo = timeChild(['run', 'configs/demo.yaml', '--out', join(mkdtempSync(join(tmpdir(), 'tb-demo-')), 'out'), '--quiet'], process.cwd());
  rows.push({ name: 'demo memo end to end (4 series, HTML + PDF)', ms: demo.ms, target: 10_000, extra: { 'peak MB': demo.peakMb } });
  const root = mkdtempSync(join(tmpdir(), 'tb-batch-'));
  try {
    const configs = writeBatch(root);
    const html = timeChild(['run', ...configs, '--quiet'], root);
    rows.push({ name: '100-series batch, 10 configs, HTML', ms: html.ms, target: 25_000, extra: { 'peak MB': html.peakMb, 'target MB': 400 } });
    const pdf = timeChild(['run', ...configs, '--formats', 'html,pdf', '--quiet'], root);
    rows.push({ name: '100-series batch, 10 configs, HTML + PDF', ms: pdf.ms, extra: { 'peak MB': pdf.peakMb } });
  } finally {
    rmSync(root, { recursive: true, force: true });
  }
  return rows;
}
