// Runs the compiled command line in a child process for the benchmarks that time whole
// processes: wall time and the child's peak resident set (worker threads included).
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const CLI = resolve('dist/bundle/cli.js');

/** Runs `trendbrief ARGS` in a child process; returns wall time and peak RSS in MB. */
export function timeChild(args: readonly string[], cwd: string): { ms: number; peakMb: number } {
  const script = `const { cli } = await import(${JSON.stringify(CLI)});
const code = await cli(${JSON.stringify(args)}, { stdout: () => {}, stderr: (t) => process.stderr.write(t) });
process.stdout.write(JSON.stringify({ code, maxRss: process.resourceUsage().maxRSS }));`;
  // A script file rather than `-e`: worker threads inherit the parent's flags, and
  // --input-type is refused anywhere but with -e.
  const file = join(mkdtempSync(join(tmpdir(), 'tb-bench-')), 'runCli.mjs');
  writeFileSync(file, script);
  const start = performance.now();
  const output = execFileSync(process.execPath, [file], { cwd, encoding: 'utf8', maxBuffer: 1 << 24 });
  const ms = performance.now() - start;
  const result = JSON.parse(output) as { code: number; maxRss: number };
  if (result.code !== 0) throw new Error(`batch bench: trendbrief ${args.join(' ')} exited ${result.code}`);
  return { ms, peakMb: result.maxRss / 1024 };
}

