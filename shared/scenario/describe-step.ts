// Plain-language descriptions of steps and schedules, for timelines a grower can read
// (the report, the comparison page). Names of our own; numbers with their units.
import type { Efficacy, Schedule, Step, Timing } from '../../models/scenario/types';

const timingWords: Record<Timing, string> = {
  'dormant-early-spring': 'dormant season / early spring',
  spring: 'spring',
  summer: 'summer',
  'late-summer': 'late summer',
  fall: 'fall',
};

const kindWords: Record<Step['kind'], string> = {
  'pre-emergence-herbicide': 'pre-emergence herbicide',
  'post-emergence-herbicide': 'post-emergence herbicide',
  'spot-treatment': 'spot treatment',
  mowing: 'mowing / shoot removal',
  'hand-removal-with-crown': 'hand removal with the root crown',
  'hand-removal-leaving-crown': 'hand removal leaving the root crown',
  cultivation: 'cultivation',
  mulch: 'mulch',
  'seed-set-prevention': 'seed-set prevention',
  'crop-competition': 'crop competition',
};

const pct = (x: number) => `${Math.round(x * 100)} %`;

export function scheduleWords(s: Schedule): string {
  switch (s.kind) {
    case 'every-year':
      return 'every year';
    case 'every-k-years':
      return `every ${s.k} years from year ${s.start}`;
    case 'year-range':
      return s.first === s.last ? `in year ${s.first}` : `in years ${s.first}–${s.last}`;
  }
}

export function efficacyWords(e: Efficacy): string {
  return 'mean' in e
    ? `${pct(e.mean)} ± ${pct(e.sd)}`
    : `${pct(e.min)}–${pct(e.max)} (most likely ${pct(e.mode)})`;
}

export const timingLabel = (t: Timing) => timingWords[t];
export const kindLabel = (k: Step['kind']) => kindWords[k];

/** One sentence: when, what, on which stages, how well, at what cost. `money` formats a cost per area. */
export function describeStep(step: Step, money: (perHa: number) => string): string {
  const targets = 'targets' in step ? ` on ${step.targets.join(', ')}` : '';
  const chem =
    'chemical' in step && step.chemical
      ? ` — ${step.chemical.activeIngredient}${step.chemical.rate !== undefined ? ` at ${step.chemical.rate} ${step.chemical.rateUnit} as entered` : ''}`
      : '';
  const cost = step.cost.material + step.cost.application;
  return `${capital(scheduleWords(step.schedule))}, ${timingWords[step.timing]}: ${step.label} (${kindWords[step.kind]}${targets})${chem}; efficacy ${efficacyWords(step.efficacy)}; cost ${money(cost)}.`;
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
