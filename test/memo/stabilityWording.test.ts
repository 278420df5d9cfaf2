// The stability section's settings sentence on a series too short for growing stretches: the
// demo's desalination plant output (invented, configs/generateDemoData.ts), 20 annual values,
// where the shortest window the check uses (20 observations, src/evidence/expandingWindows.ts)
// is the whole series.
import { describe, expect, it } from 'vitest';
import { formatEvidence } from '../../src/cli/formatEvidence.js';
import { stabilityView } from '../../src/memo/view/stabilityView.js';
import { fitRecord } from '../support/runCli.js';

describe('the stability settings sentence', () => {
  it('says a 20-point history has no growing stretches instead of counting one', async () => {
    const record = await fitRecord('configs/data/desalination-output.csv', ['--max-p', '1', '--max-q', '1']);
    const stability = record.evidence.stability;
    if (stability === null) throw new Error('no stability record');
    expect(stability.windows.deterministic).toHaveLength(1);
    const view = stabilityView(stability, record.series.first, { deterministic: record.models.deterministic.seasonal, stochastic: record.models.stochastic.seasonal });
    expect(view.settings).toBe(
      'The history is too short for growing stretches: the shortest the check uses is 20 observations, the whole series, so the charts show the full-history estimates alone and only the break tests speak to stability.',
    );
    // The terminal says the same.
    expect(formatEvidence(record)).toContain('  Expanding windows: none, as the series is no longer than the shortest window (20 observations).');
  }, 60_000);
});
