/** A point estimate with a two-sided confidence interval at level `confidence` (e.g. 0.95). */
export interface Estimate {
  estimate: number;
  lower: number;
  upper: number;
  confidence: number;
}
