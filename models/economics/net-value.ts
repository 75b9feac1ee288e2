export interface YearlyNetValueInput {
  /** Value of the weed-free crop per unit area (currency/area), before weed losses. */
  readonly cropValuePerArea: number;
  /** Yield loss in % of the weed-free crop (e.g. from yieldLossPercent), 0–100. */
  readonly yieldLossPercent: number;
  /** Cost of the year's management steps per unit area (same currency and area unit). */
  readonly costPerArea: number;
}

/**
 * One year's net value per area: crop value × (1 − YL/100) − cost. The yearly series fed to
 * netPresentValue; the difference of two strategies' NPVs is what a step is worth.
 */
export function yearlyNetValue({
  cropValuePerArea,
  yieldLossPercent,
  costPerArea,
}: YearlyNetValueInput): number {
  if (!Number.isFinite(cropValuePerArea)) {
    throw new RangeError(`crop value per area must be a finite number, got ${cropValuePerArea}`);
  }
  if (!Number.isFinite(yieldLossPercent) || yieldLossPercent < 0 || yieldLossPercent > 100) {
    throw new RangeError(`yield loss must be a percentage in [0, 100], got ${yieldLossPercent}`);
  }
  if (!Number.isFinite(costPerArea)) {
    throw new RangeError(`cost per area must be a finite number, got ${costPerArea}`);
  }
  return cropValuePerArea * (1 - yieldLossPercent / 100) - costPerArea;
}
