// Every sentence a caveat rule can produce. The rules pass in numbers already formatted.
import type { TrendModelKind } from '../../base/settings.js';
import { levelPercent, MODEL_IN_TEXT } from '../wording.js';

export const caveatWording = {
  dataEndsEarly: (a: { last: string; asOf: string; missing: string; from: string; to: string; allBefore: boolean; count: number }) =>
    `The data end in ${a.last}, but the memo is as of ${a.asOf}: the ${a.missing} from ${a.from} to ${a.to} are not in the data. ` +
    (a.allBefore
      ? `The forecasts start after ${a.last}, so every one of them is for a period that has ended by the as-of period; `
      : `The forecasts start after ${a.last}, so the first ${a.count} of them are for periods that have ended by the as-of period; `) +
    'compare them with the values published since, and bring the data up to date before relying on the memo.',

  horizonLong: (a: { horizon: string; history: string; share: string }) =>
    `The forecast runs ${a.horizon} ahead from a history of ${a.history}: the horizon is ${a.share} of the history's length. ` +
    'Over a horizon that long both models extend patterns the data have shown only a few times, so read the later periods as a range of plausible paths rather than an estimate.',

  narrowLineIntervals: (a: { level: number; period: string; narrower: string; deterministic: string; stochastic: string; ratio: string }) =>
    `At ${a.period} the deterministic-trend model's ${levelPercent(a.level)} interval is ${a.narrower} narrower than the stochastic-trend model's ` +
    `(${a.deterministic} wide against ${a.stochastic}; ratio ${a.ratio}). ` +
    'That narrower range holds only if the trend line stays where the history puts it for the whole horizon. If the trend can shift, the wider range is the more honest one.',

  unitRootEvidence: (a: { kpss: string; adf: string; level: string; recommended: TrendModelKind | null }) =>
    `The unit-root checks point to a trend that wanders: the check that assumes a steady line rejected it (${a.kpss}), ` +
    `while the check that assumes lasting shocks could not rule them out (${a.adf}), both at the ${a.level} level. ` +
    (a.recommended === 'deterministic'
      ? 'This weighs against the deterministic-trend model that this memo recommends; see the reasons given for that choice.'
      : 'This weighs against the deterministic-trend model.'),

  backtestNotRun: (reason: string | undefined) =>
    'No backtest was run for this series, so neither model has been checked on forecasts made from past data. The accuracy of both is untested.' +
    (reason === undefined ? '' : ` (${reason})`),

  seasonalPattern: (a: { years: number; few: boolean; changing: boolean; share: number | null; season: string }) =>
    [
      a.few ? `The seasonal pattern rests on only ${a.years} complete year${a.years === 1 ? '' : 's'}, so each ${a.season}'s effect is estimated from a handful of values.` : '',
      a.changing
        ? `The seasonal pattern has been changing${a.share === null ? '' : ` (one ${a.season}'s effect moved by ${Math.round(a.share * 100)}% of the pattern's range between the first and last complete years)`}: next year's pattern may differ from the one forecast, and the intervals do not allow for a sudden shift.`
        : '',
    ]
      .filter((sentence) => sentence !== '')
      .join(' '),

  backtestThin: (a: { origins: number; minimum: number }) =>
    `The backtest rests on only ${a.origins} forecast origin${a.origins === 1 ? '' : 's'} (fewer than ${a.minimum}), ` +
    'so its accuracy figures and comparison tests are rough guides, not firm evidence for either model.',

  residualPattern: (a: { models: { model: TrendModelKind; p: string; lags: number }[] }) =>
    a.models
      .map(({ model, p, lags }) => `The ${MODEL_IN_TEXT[model]}'s one-step forecast errors still show a pattern over ${lags} lags (Ljung-Box ${p}).`)
      .join(' ') +
    ' A model that leaves a pattern behind has not captured all the structure in the series, so its intervals may be too narrow or too wide.',

  backTransformed: (a: { scale: string; model: TrendModelKind; level: number; period: string; above: string; below: string; point: 'median' | 'mean' }) =>
    `Both models were fitted on the ${a.scale} scale and their forecasts turned back into the original units. ` +
    `The intervals are therefore lopsided: at ${a.period} the ${MODEL_IN_TEXT[a.model]}'s ${levelPercent(a.level)} interval reaches ${a.above} above the point forecast but only ${a.below} below it. ` +
    (a.point === 'median'
      ? 'The point forecast is the median of the forecast distribution (an even chance of the outcome falling above or below it), not its average.'
      : 'The point forecast is the average of the forecast distribution, adjusted for the change of scale, so it sits above the distribution\u2019s middle.'),

  trendBreak: (a: { breaks: { model: TrendModelKind; period: string; stat: string; critical: string }[] }) =>
    a.breaks
      .map(({ model, period, stat, critical }) =>
        model === 'deterministic'
          ? `The break test finds a shift in the level or slope of the trend line from ${period} (statistic ${stat} against a 5% critical value of ${critical}).`
          : `The break test finds a shift in the drift, the average change per period, from ${period} (statistic ${stat} against a 5% critical value of ${critical}).`,
      )
      .join(' ') + ' A forecast that assumes one trend over the whole history may then mislead; the recent trend may be the better guide.',

  fixedLineExtrapolation: (a: { first: string; last: string; end: string; horizon: string }) =>
    `The deterministic-trend model assumes that the trend line fitted to ${a.first}\u2013${a.last} carries on unchanged to ${a.end}, ${a.horizon} beyond the data. ` +
    'Nothing in the data can confirm that. If the forces behind the series change, outcomes can fall outside its intervals, which are narrow precisely because they take the line as given.',
} as const;
