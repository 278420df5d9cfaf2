// What a memo says about how the earlier memos' forecasts fared (trackRecordWording.ts), read
// back against the `track_record` it was rendered from, in the section's text (page 1 repeats
// its first sentence; series titles elsewhere are the user's text and are not read):
// - the one sentence over every series: the number of earlier memos,
//   of outcomes observed, and each "L% intervals held H of T" are the overall counts;
// - each series' line: its outcomes and forecasts, and each "H of T at L%" are that series'
//   counts for the recommended choice, in the order of the series;
// - a share printed beside a count is that count's share.
import type { LevelCoverage, TrackRecord } from '../trackRecordPart.js';
import { plainText } from './memoContradictions.js';

const SECTION_START = '<section class="track-record"';

const SUMMARY = /Track record: (\d+) earlier memos?; (?:none of (?:its|their) forecasts has been observed yet|(\d+) of (?:its|their) forecasts (?:is|are) now observed(?:: ([^;.]*))?)/g;
const SUMMARY_HELD = /(\d+)% intervals (?:held )?(\d+) of (\d+)(?: \((\d+)%\))?/g;
const SERIES_LINE = /(\d+) of (\d+) forecasts? from (\d+) earlier memos? observed so far; the recommended model's intervals held (.*?), with a mean absolute error of/g;
const SERIES_HELD = /(\d+) of (\d+)(?: \((\d+)%\))? at (\d+)%/g;

function heldProblems(said: { level: string; hits: number; total: number; share?: number }[], coverage: readonly LevelCoverage[], where: string): string[] {
  return said.flatMap(({ level, hits, total, share }) => {
    const actual = coverage.find((c) => c.level === level);
    if (actual === undefined || actual.hits !== hits || actual.total !== total) return [`${where} says ${level}% intervals held ${hits} of ${total}, which is not the track record's count`];
    if (share !== undefined && Math.round((100 * hits) / total) !== share) return [`${where} gives ${share}% for ${hits} of ${total}`];
    return [];
  });
}

/** The track record section's words; empty without the section. */
function sectionText(html: string): string {
  const start = html.indexOf(SECTION_START);
  if (start < 0) return '';
  const end = html.indexOf('</section>', start);
  return plainText(html.slice(start, end < 0 ? html.length : end));
}

/** Each contradiction between the memo's track record section and its track record; empty when they agree. */
export function trackRecordClaims(record: TrackRecord | undefined, html: string): string[] {
  const text = sectionText(html);
  const problems: string[] = [];
  for (const m of text.matchAll(SUMMARY)) {
    if (record === undefined) {
      problems.push('the memo gives a track record sentence, but no track record was computed');
      continue;
    }
    const where = 'the track record sentence';
    if (Number(m[1]) !== record.earlier.length) problems.push(`${where} counts ${m[1]} earlier memos, the track record ${record.earlier.length}`);
    const outcomes = m[2] === undefined ? 0 : Number(m[2]);
    if (outcomes !== record.overall.outcomes) problems.push(`${where} counts ${outcomes} outcomes, the track record ${record.overall.outcomes}`);
    const held = [...(m[3] ?? '').matchAll(SUMMARY_HELD)].map((h) => ({ level: h[1], hits: Number(h[2]), total: Number(h[3]), share: h[4] === undefined ? undefined : Number(h[4]) }));
    problems.push(...heldProblems(held, record.overall.coverage, where));
  }
  const lines = [...text.matchAll(SERIES_LINE)];
  const tracked = (record?.series ?? []).filter((series) => series.memos.length > 0 && series.scores.recommended.outcomes > 0);
  if (lines.length !== tracked.length) problems.push(`the memo gives ${lines.length} series lines with observed outcomes, the track record has ${tracked.length}`);
  lines.forEach((line, i) => {
    const series = tracked[i];
    if (series === undefined) return;
    const where = `the line on ${series.series_id}`;
    const pending = series.memos.reduce((sum, memo) => sum + memo.forecasts - memo.observed, 0);
    const outcomes = series.scores.recommended.outcomes;
    if (Number(line[1]) !== outcomes || Number(line[2]) !== outcomes + pending || Number(line[3]) !== series.memos.length) {
      problems.push(`${where} says ${line[1]} of ${line[2]} forecasts from ${line[3]} memos, which is not the track record's count`);
    }
    const held = [...line[4].matchAll(SERIES_HELD)].map((h) => ({ level: h[4], hits: Number(h[1]), total: Number(h[2]), share: h[3] === undefined ? undefined : Number(h[3]) }));
    problems.push(...heldProblems(held, series.scores.recommended.coverage, where));
  });
  return problems;
}
