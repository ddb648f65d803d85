// Fee-schedule arithmetic: pure functions over plain data, no I/O.
export * from "./types";
export { FeeScheduleError } from "./errors";
export { computeFees } from "./compute";
export { applicableLines, isInEffect } from "./effective";
export { assertValidFacts, assertValidFeeLines } from "./validate";
export {
  dateRangeProblem,
  feeNameKey,
  isCents,
  isIsoDate,
  minMaxProblem,
  tierBoundsProblem,
  versionClashes,
  type RuleProblem,
} from "./rules";
export { centsToDollarsText, divideRoundHalfUp, formatUsd, formatUsdExact, parseUsd } from "./money";
export { formatKw, isWholeWatts, kwToWatts, parsePercent } from "./quantities";
export { feeAmountText, feeTotalText } from "./line-amount";
export {
  planLineRefund,
  refundableCents,
  returnedFeeKeys,
  type LineRefundPlan,
  type PaidLine,
  type PaidPayment,
  type StandingRefund,
} from "./refunds";
