export interface NetPresentValueOptions {
  /**
   * true (default): cashFlows[0] is year 1 and is discounted by (1 + r)^1, like a spreadsheet's NPV
   * function — costs and returns of the first season arrive at its end.
   * false: cashFlows[0] is year 0 (today) and is not discounted; cashFlows[t] is divided by (1 + r)^t.
   */
  readonly firstYearDiscounted?: boolean;
}

/**
 * Net present value of a series of yearly cash flows at a yearly discount rate (a fraction: 0.05 = 5 %):
 *     NPV = Σ_t CF_t / (1 + r)^(t + k),  k = 1 if firstYearDiscounted (default) else 0.
 * Each term uses Math.pow rather than a running product so that long horizons do not accumulate a
 * rounding drift in the discount factor.
 */
export function netPresentValue(
  ratePerYear: number,
  cashFlows: readonly number[],
  options: NetPresentValueOptions = {},
): number {
  if (!Number.isFinite(ratePerYear) || ratePerYear <= -1) {
    throw new RangeError(
      `discount rate per year must be a finite fraction > -1 (0.05 = 5 %), got ${ratePerYear}`,
    );
  }
  const offset = (options.firstYearDiscounted ?? true) ? 1 : 0;
  let value = 0;
  cashFlows.forEach((cashFlow, t) => {
    if (!Number.isFinite(cashFlow)) {
      throw new RangeError(`cash flow of year index ${t} must be a finite number, got ${cashFlow}`);
    }
    value += cashFlow / Math.pow(1 + ratePerYear, t + offset);
  });
  return value;
}
