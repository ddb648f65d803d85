/**
 * Thrown when fee lines or project facts reach the arithmetic in a state the schedule form
 * would have refused (a negative rate, tiers out of order, a minimum above the maximum): stored
 * data that bypassed `FeeScheduleInput`, or a caller's bug. `field` is a path in the zod style
 * ("lines.2.basis.tiers.1.upToKw", "facts.dcKw") so it can be shown beside the input or logged.
 */
export class FeeScheduleError extends Error {
  readonly code = "INVALID_FEE_SCHEDULE" as const;
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "FeeScheduleError";
  }
}
