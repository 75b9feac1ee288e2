/**
 * Crop yield loss from weed density: the rectangular hyperbola of Cousens (1985), J. Agric. Sci.
 * 105:513–521,
 *     YL = I·D / (1 + I·D/A)
 * YL: % yield loss relative to the weed-free crop; D: weed density (plants/m²);
 * I: % loss per plant/m² as D → 0 (the initial slope); A: asymptotic % loss as D → ∞.
 * Chosen because it behaves at both ends: linear in sparse stands, saturating in dense ones, and its
 * two parameters are the ones trials report.
 */
export function yieldLossPercent(
  density: number,
  lossPerPlantPercent: number,
  maxLossPercent: number,
): number {
  if (!Number.isFinite(density) || density < 0) {
    throw new RangeError(`weed density must be a finite number ≥ 0 plants/m², got ${density}`);
  }
  if (!Number.isFinite(lossPerPlantPercent) || lossPerPlantPercent < 0) {
    throw new RangeError(`I (% loss per plant/m²) must be a finite number ≥ 0, got ${lossPerPlantPercent}`);
  }
  if (!Number.isFinite(maxLossPercent) || maxLossPercent <= 0 || maxLossPercent > 100) {
    throw new RangeError(`A (asymptotic % loss) must be in (0, 100], got ${maxLossPercent}`);
  }
  const linear = lossPerPlantPercent * density;
  if (linear === 0) return 0;
  // Same hyperbola written as A / (1 + A/(I·D)): every IEEE operation in it is monotone, so the
  // result is exactly non-decreasing in D and never exceeds A, which I·D/(1 + I·D/A) (I·D in both
  // numerator and denominator) does not guarantee after rounding.
  return maxLossPercent / (1 + maxLossPercent / linear);
}
