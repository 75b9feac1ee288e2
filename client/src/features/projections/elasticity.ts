/*
 * "Which stage to hit": the matrix view's elasticities summed by the kind of transition
 * they belong to. An elasticity e_ij is the proportional change in λ for a proportional
 * change in the entry a_ij, and the e_ij sum to 1 (Caswell 2001, Matrix Population
 * Models, 2nd ed., ch. 9.2), so a group's sum is the share of λ that the group carries:
 * cutting every transition of a group by 10 % lowers λ by about (sum × 10) %.
 */

export type TransitionGroup = 'seedSet' | 'emergence' | 'seedbankSurvival' | 'plantSurvival';

export const transitionGroups: Record<TransitionGroup, { name: string; explanation: string }> = {
  seedSet: {
    name: 'Seed set (fecundity)',
    explanation: 'Plants adding seed to the seedbank: flowering, seeds per plant, seed reaching the soil.',
  },
  emergence: {
    name: 'Emergence and establishment',
    explanation: 'Seeds in the soil germinating and growing into established plants.',
  },
  seedbankSurvival: {
    name: 'Seedbank survival',
    explanation: 'Seeds staying alive and dormant in the soil from one year to the next, shallow and deep.',
  },
  plantSurvival: {
    name: 'Established-plant survival',
    explanation: 'Established plants living through the year, including regrowth from the root crown.',
  },
};

const isPlantStage = (stage: string) => !stage.startsWith('seedbank');

/** Summed elasticity per group, largest first. A group with no transition in the matrix is left out. */
export function groupElasticities(
  stages: readonly string[],
  elasticities: readonly (readonly number[])[],
): { group: TransitionGroup; share: number }[] {
  const sums: Record<TransitionGroup, number> = {
    seedSet: 0,
    emergence: 0,
    seedbankSurvival: 0,
    plantSurvival: 0,
  };
  const present = new Set<TransitionGroup>();
  // Column j is the stage a transition starts from, row i the stage it leads to.
  elasticities.forEach((row, i) =>
    row.forEach((e, j) => {
      const from = isPlantStage(stages[j]);
      const to = isPlantStage(stages[i]);
      const group: TransitionGroup = from
        ? to
          ? 'plantSurvival'
          : 'seedSet'
        : to
          ? 'emergence'
          : 'seedbankSurvival';
      sums[group] += e;
      if (e > 0) present.add(group);
    }),
  );
  return (Object.keys(sums) as TransitionGroup[])
    .filter((g) => present.has(g))
    .map((group) => ({ group, share: sums[group] }))
    .sort((a, b) => b.share - a.share);
}
