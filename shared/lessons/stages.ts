// "Which stage to hit": the engine's matrix elasticities summed by the stage a
// transition leaves and enters. Elasticities sum to 1 (Caswell 2001, Matrix Population
// Models, 2nd ed., ch. 9.2), so each group's sum is the share of λ it carries.

export type TransitionGroup = 'seed-set' | 'emergence' | 'seedbank' | 'plants';

export const transitionNames: Record<TransitionGroup, string> = {
  'seed-set': 'Seed set: plants adding seed to the soil',
  emergence: 'Emergence: seed becoming established plants',
  seedbank: 'Seedbank survival: seed staying alive in the soil',
  plants: 'Plant survival: established plants living on',
};

/** Summed elasticity per group, largest first; groups with no transition are left out. */
export function elasticityShares(
  stages: readonly string[],
  elasticities: readonly (readonly number[])[],
): { group: TransitionGroup; share: number }[] {
  const sums = new Map<TransitionGroup, number>();
  const isPlant = (i: number) => !stages[i].startsWith('seedbank');
  elasticities.forEach((row, i) =>
    row.forEach((e, j) => {
      if (!(e > 0)) return;
      // Column j is where a transition starts, row i where it leads.
      const group: TransitionGroup = isPlant(j)
        ? isPlant(i)
          ? 'plants'
          : 'seed-set'
        : isPlant(i)
          ? 'emergence'
          : 'seedbank';
      sums.set(group, (sums.get(group) ?? 0) + e);
    }),
  );
  return [...sums].map(([group, share]) => ({ group, share })).sort((a, b) => b.share - a.share);
}
