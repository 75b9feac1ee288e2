// The cautions shown wherever a chemical step is planned or reported.
import type { Strategy } from '../../models/scenario/types';
import { chemicalKinds } from '../../models/scenario/step-kinds';

export const pesticideCautions: readonly string[] = [
  'The pesticide label is the legal guide: read and follow it.',
  'Registrations, permitted crops and maximum rates differ by jurisdiction; check what applies where you farm.',
  'Defer to local regulations and to licensed applicators. Seedwake records rates as you enter them and never suggests one.',
];

export function hasChemicalStep(strategy: Strategy): boolean {
  return strategy.steps.some((step) => chemicalKinds.includes(step.kind));
}
