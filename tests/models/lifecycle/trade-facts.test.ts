// Facts of the trade used as check values. Each is marked
// "common practice, no published source".
import { describe, expect, it } from 'vitest';
import { projectMeanField } from '../../../models/projection/mean-field';
import { runReplicates } from '../../../models/projection/replicates';
import { parameterCatalogue } from '../../../shared/scenario/parameters';
import { at, scenarioFrom } from '../projection/fixtures';
import type { LooseJson } from '../projection/fixtures';

/** A bare perennial on a small field with no seedbank; `edit` adds what a test needs. */
const bare = (edit: (s: LooseJson) => void) =>
  scenarioFrom('demo-perennial-dock', (s) => {
    s.field.initialSeedbank = { shallow: 0, deep: 0 };
    s.field.immigrantSeedRain = 0;
    s.field.cropCompetition = 0;
    s.profile.environment = { germinationCv: 0, establishmentCv: 0, fecundityCv: 0 };
    s.strategy.steps = [];
    s.replicates = 50;
    edit(s);
  });

describe('facts of the trade', () => {
  it('one flowering dock plant setting 60,000 seeds adds 6,000 seeds/m² over 10 m²', () => {
    // Common practice, no published source: a flowering plant of a perennial broadleaf dock can
    // shed about 60,000 seeds a year (27,000–60,000 reported across regions).
    const scenario = bare((s) => {
      s.field.areaHa = 0.001; // 10 m²
      s.field.initialPlants = 0.1; // one plant
      s.profile.floweringProbability = 1;
      s.profile.fecundity = { maxSeedsPerPlant: 60_000, densityCoefficient: 0 }; // Poisson counts
      s.profile.seedRainLoss = 0;
      s.horizonYears = 1;
    });
    const mf = projectMeanField(scenario);
    expect(mf.series.seedsProduced[1]).toBeCloseTo(6000, 9);
    expect(mf.series.seedRain[1]).toBeCloseTo(6000, 9);
    // Stochastic: Poisson(60,000) seeds from the one plant; 5 SE of the 50-replicate mean is 5·√60000/√50 seeds.
    const block = runReplicates(scenario, 0, 50);
    let total = 0;
    for (let r = 0; r < 50; r++) total += at(block.series.seedRain, 1, r, 1) * 10;
    expect(Math.abs(total / 50 - 60_000)).toBeLessThan((5 * Math.sqrt(60_000)) / Math.sqrt(50));
  });

  it('with the catalogue’s buried-seed decay, viable seed remains after 40 years', () => {
    // Common practice, no published source: dock seed stays viable in soil for more than 40 years.
    const scenario = bare((s) => {
      s.field.initialSeedbank = { shallow: 0, deep: 100 };
      s.field.initialPlants = 0;
      s.field.areaHa = 0.1; // 100,000 buried seeds
      s.profile.seedDecay.deep = parameterCatalogue['profile.seedDecay.deep'].default;
      s.horizonYears = 40;
    });
    const block = runReplicates(scenario, 0, 50);
    for (let r = 0; r < 50; r++) expect(at(block.series.seedbankDeep, 40, r, 40)).toBeGreaterThan(1);
    expect(projectMeanField(scenario).series.seedbankDeep[40]).toBeGreaterThan(1);
  });

  it('hand removal that leaves the root crown does not kill; removal with the crown does', () => {
    // Common practice, no published source: the regenerative part of the root crown is the top
    // ~10 cm (4 in), so removal that leaves it lets the plant regrow.
    const removal = (kind: string) =>
      bare((s) => {
        s.field.initialPlants = 2;
        s.profile.floweringProbability = 0;
        s.profile.overWinterSurvival = 1;
        s.profile.rootCrownRegrowth = 1;
        s.horizonYears = 5;
        s.strategy.steps = [
          {
            label: 'pull every plant',
            kind,
            timing: 'spring',
            schedule: { kind: 'every-year' },
            targets: ['rosettes'],
            efficacy: { mean: 1, sd: 0 },
            cost: { material: 0, application: 500 },
          },
        ];
      });
    const leaving = runReplicates(removal('hand-removal-leaving-crown'), 0, 20);
    const withCrown = runReplicates(removal('hand-removal-with-crown'), 0, 20);
    for (let r = 0; r < 20; r++) {
      for (let t = 1; t <= 5; t++) {
        expect(at(leaving.series.established, 5, r, t)).toBe(2);
        expect(at(withCrown.series.established, 5, r, t)).toBe(0);
      }
    }
  });

  it('light-requiring seed (g_deep = 0) does not emerge from the deep layer', () => {
    // Common practice, no published source: the seeds need light to germinate, so burial
    // suppresses emergence.
    const scenario = bare((s) => {
      s.field.initialSeedbank = { shallow: 0, deep: 5000 };
      s.field.initialPlants = 0;
      s.profile.germination = { shallowByAge: [0.5], deep: 0 };
      s.horizonYears = 10;
    });
    const block = runReplicates(scenario, 0, 20);
    for (let r = 0; r < 20; r++)
      for (let t = 1; t <= 10; t++) expect(at(block.series.emerged, 10, r, t)).toBe(0);
    // The same seeds brought to the surface do emerge (the check can fail).
    const surfaced = bare((s) => {
      s.field.initialSeedbank = { shallow: 5000, deep: 0 };
      s.profile.germination = { shallowByAge: [0.5], deep: 0 };
      s.horizonYears = 10;
    });
    expect(projectMeanField(surfaced).series.emerged[1]).toBeGreaterThan(0);
  });

  it('records the germination-temperature observation with the germination default', () => {
    // Common practice, no published source: germination was best near 20 °C (68 °F) among 15, 20
    // and 25 °C (59, 68, 77 °F). The catalogue shows it beside the field.
    const entry = parameterCatalogue['profile.germination.shallowByAge[]'];
    expect(entry.note).toMatch(/20 °C \(68 °F\)/);
  });
});
