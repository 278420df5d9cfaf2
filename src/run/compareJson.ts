// Two JSON values compared part by part, as verify needs: numbers agree within a tolerance,
// everything else (text, booleans, null, keys, list lengths) must be equal. Each difference
// names its path in the document, `records[0].forecasts.stochastic[3].point`.
//
// The tolerance: |a − b| ≤ max(1e-12, 1e-9 · max(|a|, |b|)). The recompute runs the same code
// on the same inputs, so on the same Node version every number comes out identical (see
// DEVELOPERS.md, "verify"); the slack is for another Node or V8, whose Math.exp, log or pow may
// round differently in the last bit. Relative 1e-9 is some seven digits above double rounding
// yet far below any change of data or settings; the absolute 1e-12 keeps numbers that should
// be 0 (a drift of 2e-17) from failing a relative test.
export const TOLERANCE = { relative: 1e-9, absolute: 1e-12 } as const;
export const TOLERANCE_TEXT = 'relative 1e-9 (absolute 1e-12 near zero)';

export interface Difference {
  path: string;
  stored: string;
  rerun: string;
}

export interface Comparison {
  differences: Difference[];
  /** Numbers compared. */
  numbers: number;
}

export function numbersAgree(a: number, b: number): boolean {
  return a === b || Math.abs(a - b) <= Math.max(TOLERANCE.absolute, TOLERANCE.relative * Math.max(Math.abs(a), Math.abs(b)));
}

const IDENTIFIER = /^[A-Za-z_$][\w$]*$/;

function keyPath(path: string, key: string): string {
  if (!IDENTIFIER.test(key)) return `${path}[${JSON.stringify(key)}]`;
  return path === '' ? key : `${path}.${key}`;
}

/** A value as the report shows it: JSON, long values cut short. */
export function shownValue(value: unknown): string {
  if (value === undefined) return 'missing';
  const text = JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function compareJson(stored: unknown, rerun: unknown, path = ''): Comparison {
  const result: Comparison = { differences: [], numbers: 0 };
  walk(stored, rerun, path, result);
  return result;
}

function walk(stored: unknown, rerun: unknown, path: string, result: Comparison): void {
  if (typeof stored === 'number' && typeof rerun === 'number') {
    result.numbers += 1;
    if (!numbersAgree(stored, rerun)) result.differences.push({ path, stored: shownValue(stored), rerun: shownValue(rerun) });
    return;
  }
  if (Array.isArray(stored) && Array.isArray(rerun)) {
    for (let i = 0; i < Math.max(stored.length, rerun.length); i++) walk(stored[i], rerun[i], `${path}[${i}]`, result);
    return;
  }
  if (isObject(stored) && isObject(rerun)) {
    const keys = [...Object.keys(stored), ...Object.keys(rerun).filter((key) => !Object.hasOwn(stored, key))];
    for (const key of keys) walk(Object.hasOwn(stored, key) ? stored[key] : undefined, Object.hasOwn(rerun, key) ? rerun[key] : undefined, keyPath(path, key), result);
    return;
  }
  if (stored !== rerun) result.differences.push({ path, stored: shownValue(stored), rerun: shownValue(rerun) });
}
