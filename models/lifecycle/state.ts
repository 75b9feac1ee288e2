// The population of one field at the census (late winter) plus the stand's pools used
// during the year. Everything is a count for the whole field, so the sampled chance can
// draw integers; the projections divide by the area to report densities.
import type { CyclePlan } from './plan';

export class CycleState {
  /** Viable seeds by age class: [0, A) shallow, [A, 2A) deep; class A−1 of each layer is absorbing. */
  readonly bank: Float64Array;
  /** Established plants that have lived through at least one winter (the census stock). */
  rosettes = 0;
  // In-year pools, reset by the year itself.
  seedlings = 0;
  flowering = 0;
  fragments = 0;
  freshShallow = 0;
  freshDeep = 0;

  constructor(readonly ageClasses: number) {
    this.bank = new Float64Array(2 * ageClasses);
  }

  /**
   * The first census. The entered seedbank has no known age structure; it is placed in
   * the oldest (absorbing) class, i.e. treated as seed past any first-year dormancy.
   */
  resetTo(plan: CyclePlan): void {
    const A = this.ageClasses;
    this.bank.fill(0);
    this.bank[A - 1] = plan.initialShallow;
    this.bank[2 * A - 1] = plan.initialDeep;
    this.rosettes = plan.initialPlants;
  }

  shallowTotal(): number {
    let s = 0;
    for (let k = 0; k < this.ageClasses; k++) s += this.bank[k];
    return s;
  }

  deepTotal(): number {
    let s = 0;
    for (let k = this.ageClasses; k < 2 * this.ageClasses; k++) s += this.bank[k];
    return s;
  }
}

/** What happened during one year, for the whole field (cost per ha). Reused across years. */
export class YearFlows {
  emerged = 0;
  /** Plants standing after the spring steps: this year's seedlings plus older plants. */
  established = 0;
  flowering = 0;
  seedsProduced = 0;
  seedRain = 0;
  costPerHa = 0;
}
