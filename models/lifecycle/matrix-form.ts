// The annual cycle as a projection matrix. Without crowding and immigrant seed, one year
// of the mean-field cycle under a steady program is a linear map of the census state
// (seedbank by layer and age class, established plants); applying it to each unit vector
// gives the matrix column by column, A[i][j] = stage j's contribution to stage i a year
// later (Caswell 2001, Matrix Population Models, 2nd ed., ch. 2–4).
import type { Scenario } from '../scenario/types';
import { analyzeMatrix } from '../matrix/analysis';
import type { MatrixAnalysis } from '../matrix/analysis';
import { meanFieldChance } from './chance';
import { planCycle } from './plan';
import { CycleState, YearFlows } from './state';
import { advanceYear, YearScratch } from './year';

export interface LinearisedCycle {
  readonly stages: string[];
  readonly matrix: number[][];
}

/** The scenario with crowding switched off and no immigrant seed: the linear regime. */
export function withoutDensityDependence(scenario: Scenario): Scenario {
  return {
    ...scenario,
    profile: {
      ...scenario.profile,
      fecundity: { ...scenario.profile.fecundity, densityCoefficient: 0 },
      establishment: { ...scenario.profile.establishment, density: { kind: 'beverton-holt', c: 0 } },
    },
    field: { ...scenario.field, immigrantSeedRain: 0 },
  };
}

export function stageNames(ageClasses: number): string[] {
  const names: string[] = [];
  for (const layer of ['shallow', 'deep']) {
    for (let k = 0; k < ageClasses; k++) {
      names.push(`seedbank ${layer}, age ${k}${k === ageClasses - 1 && ageClasses > 1 ? '+' : ''}`);
    }
  }
  names.push('established plants');
  return names;
}

/**
 * The matrix of the steady program that repeats, every year, the steps scheduled in
 * `programYear` (1..horizon; default 1).
 */
export function linearisedCycle(scenario: Scenario, programYear = 1): LinearisedCycle {
  if (!Number.isInteger(programYear) || programYear < 1 || programYear > scenario.horizonYears) {
    throw new RangeError(`program year ${programYear} is outside the horizon 1–${scenario.horizonYears}`);
  }
  const plan = planCycle(withoutDensityDependence(scenario));
  const A = plan.ageClasses;
  const n = 2 * A + 1;
  const state = new CycleState(A);
  const scratch = new YearScratch();
  const flows = new YearFlows();
  const matrix = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    state.bank.fill(0);
    state.rosettes = 0;
    if (j < 2 * A) state.bank[j] = 1;
    else state.rosettes = 1;
    advanceYear(plan, state, meanFieldChance, programYear, null, scratch, flows);
    for (let i = 0; i < 2 * A; i++) matrix[i][j] = state.bank[i];
    matrix[2 * A][j] = state.rosettes;
  }
  return { stages: stageNames(A), matrix };
}

export function analyzeLinearisedCycle(
  scenario: Scenario,
  programYear = 1,
): LinearisedCycle & { analysis: MatrixAnalysis } {
  const cycle = linearisedCycle(scenario, programYear);
  return { ...cycle, analysis: analyzeMatrix(cycle.matrix) };
}
