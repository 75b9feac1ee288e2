// Stage formulas of the model brief, checked in the mean field (exact expectations) against
// the published functional forms, and the effects of management steps on the right stage.
import { describe, expect, it } from 'vitest';
import { NPV } from '@formulajs/formulajs';
import { projectMeanField } from '../../../models/projection/mean-field';
import { runReplicates } from '../../../models/projection/replicates';
import { summarise } from '../../../models/projection/summarise';
import { scenarioFrom } from '../projection/fixtures';
import type { LooseJson } from '../projection/fixtures';

/** A perennial stand of `plants`/m² with no seedbank, no noise and no steps (1 ha). */
const stand = (plants: number, edit: (s: LooseJson) => void = () => {}) =>
  scenarioFrom('demo-perennial-dock', (s) => {
    s.field = {
      ...s.field,
      areaHa: 1,
      initialSeedbank: { shallow: 0, deep: 0 },
      initialPlants: plants,
      immigrantSeedRain: 0,
      cropCompetition: 0,
    };
    s.profile.environment = { germinationCv: 0, establishmentCv: 0, fecundityCv: 0 };
    s.profile.floweringProbability = 1;
    s.strategy.steps = [];
    s.horizonYears = 1;
    edit(s);
  });

describe('stage formulas', () => {
  it('seed production follows Watkinson (1980): f_max / (1 + a·F) per flowering plant, cut by crop competition', () => {
    // Watkinson 1980, J. Theor. Biol. 83: 345–357 (reference recalled from memory).
    for (const [F, a] of [
      [1, 0.5],
      [10, 0.5],
      [40, 0.05],
    ]) {
      const run = projectMeanField(
        stand(F, (s) => {
          s.profile.fecundity = { maxSeedsPerPlant: 60_000, densityCoefficient: a };
          s.field.cropCompetition = 0.25;
        }),
      );
      expect(run.series.seedsProduced[1]).toBeCloseTo(((F * 60_000) / (1 + a * F)) * 0.75, 6);
    }
  });

  it('establishment follows Beverton–Holt s_e / (1 + c·N), or a ceiling of K plants/m²', () => {
    // Beverton & Holt 1957, On the Dynamics of Exploited Fish Populations (form recalled from memory).
    const seeded = (density: Record<string, unknown>) =>
      scenarioFrom('lesson-seedbank-decay', (s) => {
        s.field.areaHa = 1;
        s.profile.germination = { shallowByAge: [0.5], deep: 0 };
        s.profile.establishment = { survival: 0.4, density };
        s.horizonYears = 1;
      });
    // 1000 seeds/m² × g 0.5 = 500 emerging seedlings/m².
    const bh = projectMeanField(seeded({ kind: 'beverton-holt', c: 0.01 }));
    expect(bh.series.established[1]).toBeCloseTo((500 * 0.4) / (1 + 0.01 * 500), 9);
    const capped = projectMeanField(seeded({ kind: 'ceiling', K: 30 }));
    expect(capped.series.established[1]).toBeCloseTo(30, 9);
    const below = projectMeanField(seeded({ kind: 'ceiling', K: 500 }));
    expect(below.series.established[1]).toBeCloseTo(200, 9);
  });

  it('seed-set prevention cuts seed return, not seed production; mowing cuts seeds per plant', () => {
    // Model brief, stage 6: mowing cuts seeds per plant; seed-head removal cuts seed return.
    const withStep = (kind: string, perPlant: number, ret: number) =>
      projectMeanField(
        stand(1, (s) => {
          s.profile.fecundity = { maxSeedsPerPlant: 10_000, densityCoefficient: 0 };
          s.profile.seedRainLoss = 0.2;
          s.strategy.steps = [
            {
              label: 'cut',
              kind,
              timing: 'late-summer',
              schedule: { kind: 'every-year' },
              seedsPerPlantReduction: perPlant,
              seedReturnReduction: ret,
              efficacy: { mean: 0.5, sd: 0 },
              cost: { material: 0, application: 100 },
            },
          ];
        }),
      );
    const prevention = withStep('seed-set-prevention', 0, 1);
    expect(prevention.series.seedsProduced[1]).toBeCloseTo(10_000, 9);
    expect(prevention.series.seedRain[1]).toBeCloseTo(10_000 * 0.8 * 0.5, 9);
    const mowing = withStep('mowing', 0.9, 0);
    expect(mowing.series.seedsProduced[1]).toBeCloseTo(10_000 * (1 - 0.5 * 0.9), 9);
  });

  it('a perfect pre-emergence step removes every emerging seedling, none of the established plants', () => {
    const run = projectMeanField(
      scenarioFrom('lesson-seedbank-decay', (s) => {
        s.field.areaHa = 1;
        s.profile.establishment.survival = 0.5;
        s.strategy.steps = [
          {
            label: 'pre',
            kind: 'pre-emergence-herbicide',
            timing: 'spring',
            schedule: { kind: 'every-year' },
            efficacy: { mean: 1, sd: 0 },
            cost: { material: 1, application: 1 },
          },
        ];
      }),
    );
    expect(run.series.emerged[1]).toBeCloseTo(100, 9);
    expect(run.series.established[1]).toBe(0);
  });

  it('cultivation buries seed and can spread a perennial by root fragments', () => {
    // Model brief, stage 9: soil disturbance moves seeds between layers and fragments roots.
    const run = projectMeanField(
      stand(2, (s) => {
        s.field.initialSeedbank = { shallow: 1000, deep: 0 };
        s.profile.germination = { shallowByAge: [0], deep: 0 };
        s.profile.seedDecay = { shallow: 0, deep: 0 };
        s.profile.floweringProbability = 0;
        s.profile.overWinterSurvival = 1;
        s.profile.fragmentEstablishment = 0.5;
        s.horizonYears = 2;
        s.strategy.steps = [
          {
            label: 'till',
            kind: 'cultivation',
            timing: 'fall',
            schedule: { kind: 'year-range', first: 1, last: 1 },
            targets: ['rosettes'],
            burial: 0.3,
            exhumation: 0,
            fragmentsPerPlant: 4,
            efficacy: { mean: 0.5, sd: 0 },
            cost: { material: 0, application: 80 },
          },
        ];
      }),
    );
    expect(run.series.seedbankDeep[1]).toBeCloseTo(300, 9);
    expect(run.series.seedbankShallow[1]).toBeCloseTo(700, 9);
    // 2 plants/m²: half killed (1), each cut into 4 fragments, half of which establish (2):
    // 3 plants stand in year 2.
    expect(run.series.established[2]).toBeCloseTo(3, 9);
  });
});

describe('economics of a projection', () => {
  it('yield loss follows Cousens (1985) and NPV matches the spreadsheet NPV of @formulajs', () => {
    // Cousens 1985, J. Agric. Sci. 105: 513–521: YL = I·D / (1 + I·D/A). A stand of D = 5
    // plants/m² that neither flowers nor dies: I = 2, A = 40 → YL = 10 / 1.25 = 8 % every year.
    const scenario = stand(5, (s) => {
      s.profile.floweringProbability = 0;
      s.profile.overWinterSurvival = 1;
      s.field.yieldLoss = { I: 2, A: 40 };
      s.field.cropValuePerHa = 10_000;
      s.horizonYears = 4;
      s.replicates = 3;
      s.discountRate = 0.07;
      s.strategy.steps = [
        {
          label: 'mow',
          kind: 'mowing',
          timing: 'summer',
          schedule: { kind: 'year-range', first: 2, last: 3 },
          seedsPerPlantReduction: 0.5,
          seedReturnReduction: 0,
          efficacy: { mean: 0.5, sd: 0 },
          cost: { material: 0, application: 150 },
        },
      ];
    });
    const summary = summarise(scenario, runReplicates(scenario, 0, 3));
    expect(summary.economics.yieldLossPercent.mean.slice(1)).toEqual(
      [8, 8, 8, 8].map((x) => expect.closeTo(x, 12)),
    );
    const flows = [1, 2, 3, 4].map((t) => 10_000 * 0.92 - (t === 2 || t === 3 ? 150 : 0));
    expect(summary.economics.npvPerHa.mean).toBeCloseTo(NPV(0.07, ...flows) as number, 6);
    expect(summary.economics.cumulativeCostPerHa.mean).toEqual([0, 0, 150, 300, 300]);
  });
});
