import type { RateWarning, RecordedMaxRate } from '../../shared/api/strategies';
import type { Strategy } from '../../models/scenario/types';

const same = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * Compares each chemical step's entered rate with the maximum rates the user recorded
 * from labels. Seedwake never supplies a rate; it only checks the user's own numbers.
 * `crop` narrows the check to the field's crop when the strategy belongs to a field.
 */
export function rateWarnings(
  strategy: Strategy,
  maxRates: readonly RecordedMaxRate[],
  crop: string | null,
): RateWarning[] {
  const warnings: RateWarning[] = [];
  strategy.steps.forEach((step, stepIndex) => {
    const chem = 'chemical' in step ? step.chemical : undefined;
    if (!chem || chem.rate === undefined || chem.rateUnit === undefined) return;
    for (const max of maxRates) {
      if (!same(max.activeIngredient, chem.activeIngredient) || (crop !== null && !same(max.crop, crop)))
        continue;
      const name = `Step ${stepIndex + 1} (${step.label})`;
      const { rate, rateUnit } = chem;
      if (!same(max.rateUnit, rateUnit)) {
        warnings.push({
          stepIndex,
          message: `${name}: rate is in ${rateUnit} but the recorded maximum for ${max.crop} is in ${max.rateUnit}; check the label`,
        });
      } else if (rate > max.maxRate) {
        warnings.push({
          stepIndex,
          message: `${name}: ${rate} ${rateUnit} of ${chem.activeIngredient} exceeds the maximum ${max.maxRate} ${max.rateUnit} you recorded for ${max.crop}`,
        });
      }
    }
  });
  return warnings;
}
