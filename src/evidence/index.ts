// The evidence stage's statistical tests, pure functions over plain arrays:
//   series ──kpssTest──▶ KpssResult ─┐
//   series ──adfTest───▶ AdfResult ──┴─trendVerdict──▶ TrendVerdict
//   residuals ──ljungBox / residualAcf / jarqueBera──▶ residual checks
//   series + orders ──trendStability──▶ expanding-window slope and drift, sup-Wald break tests
export { adfTest, type AdfOptions } from './adfTest.js';
export { jarqueBera } from './jarqueBera.js';
export { kpssTest, type KpssOptions } from './kpssTest.js';
export { ljungBox, type LjungBoxOptions } from './ljungBox.js';
export { mackinnonCritical } from './mackinnonCritical.js';
export { mackinnonPValue } from './mackinnonPValue.js';
export { kpssCritical, kpssPValue } from './kpssTable.js';
export { residualAcf } from './residualAcf.js';
export { trendVerdict } from './trendVerdict.js';
export { formatPValue, trendVerdictSummary } from './messages.js';
export type * from './types.js';
export { trendStability, type ArmaOrder, type StabilityOrders } from './trendStability.js';
export { breakTestSummary } from './messages.js';
