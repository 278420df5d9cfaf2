// A named moment of publishing at which a test can hold a run and kill it: with
// TRENDBRIEF_PAUSE_AT set to the step's name, the process says so on stderr and then blocks for
// good, so the test's SIGKILL lands exactly between two steps. Unset, it does nothing.
import { writeSync } from 'node:fs';

export type PublishStep = 'files-written' | 'version-named' | 'link-swapped' | 'folder-moved-aside';

export function pauseAtStep(step: PublishStep): void {
  if (process.env.TRENDBRIEF_PAUSE_AT !== step) return;
  writeSync(2, `paused at ${step}\n`);
  // Blocks the thread without spinning until the process is killed.
  for (;;) Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0);
}
