// The parts of a record document (record.json) that the monthly comparison reads, and a
// reader that accepts a file from an earlier run only when those parts have the right shape:
// a folder whose record.json is missing, unreadable, not a regular file (a FIFO, a link to
// /dev/zero: never opened, so it cannot make the run wait) or of another shape is skipped,
// never trusted.
import { MAX_RUN_DOCUMENT_BYTES, regularFileBytes } from '../base/readRegularFile.js';
import { sha256 } from './manifest.js';
import type { TrendModelKind } from '../base/settings.js';
import { RECORD_DOCUMENT_SCHEMA, type SeriesHistory } from './recordDocument.js';

export interface ComparableForecast {
  h: number;
  period: string;
  point: number | null;
  /** Interval ends by level key; read by the track record, absent in hand-made documents. */
  intervals?: Record<string, [number | null, number | null]>;
}

export interface ComparableRecord {
  series: { id: string; title: string; last: string };
  models: Record<TrendModelKind, { p: number; q: number }>;
  forecasts: Record<TrendModelKind, ComparableForecast[]>;
  recommendation?: { model: TrendModelKind };
}

export interface ComparableDocument {
  memo: { id: string; as_of: string };
  run_date: string;
  records: ComparableRecord[];
  /** Absent in documents written before record.json carried the observed values. */
  history?: SeriesHistory[];
}

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

type Check = (value: unknown) => boolean;

const isText: Check = (value) => typeof value === 'string';
const isWhole: Check = (value) => Number.isInteger(value);
const isNumberOrNull: Check = (value) => value === null || typeof value === 'number';
const isModel: Check = (value) => value === 'deterministic' || value === 'stochastic';

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function has(value: unknown, fields: Record<string, Check>): boolean {
  return isObject(value) && Object.entries(fields).every(([key, check]) => Object.hasOwn(value, key) && check(value[key]));
}

function listOf(check: Check): Check {
  return (value) => Array.isArray(value) && value.every(check);
}

function perModel(check: Check): Check {
  return (value) => isObject(value) && MODELS.every((model) => Object.hasOwn(value, model) && check(value[model]));
}

const isInterval: Check = (value) => Array.isArray(value) && value.length === 2 && value.every(isNumberOrNull);

const isForecast: Check = (value) =>
  has(value, { h: isWhole, period: isText, point: isNumberOrNull }) &&
  isObject(value) &&
  (value.intervals === undefined || (isObject(value.intervals) && Object.values(value.intervals).every(isInterval)));

const isRecord: Check = (value) =>
  has(value, {
    series: (series) => has(series, { id: isText, title: isText, last: isText }),
    models: perModel((model) => has(model, { p: isWhole, q: isWhole })),
    forecasts: perModel(listOf(isForecast)),
  }) &&
  isObject(value) &&
  (value.recommendation === undefined || has(value.recommendation, { model: isModel }));

const isHistory: Check = (value) => has(value, { series_id: isText, values: listOf((point) => has(point, { period: isText, value: isNumberOrNull })) });

/** True when `value` has every part the comparison reads, each of the right type. */
export function isComparableDocument(value: unknown): value is ComparableDocument {
  return (
    has(value, {
      schema: (schema) => schema === RECORD_DOCUMENT_SCHEMA,
      memo: (memo) => has(memo, { id: isText, as_of: isText }),
      run_date: isText,
      records: listOf(isRecord),
    }) &&
    isObject(value) &&
    (value.history === undefined || listOf(isHistory)(value.history))
  );
}

/** A record.json written by an earlier run, with the SHA-256 of its bytes; null when it is missing or not a record document. */
export function readComparableDocument(file: string): { document: ComparableDocument; sha256: string } | null {
  const bytes = regularFileBytes(file, MAX_RUN_DOCUMENT_BYTES);
  if (bytes === null) return null;
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch {
    return null;
  }
  return isComparableDocument(value) ? { document: value, sha256: sha256(bytes) } : null;
}
