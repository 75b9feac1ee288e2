import { describe, expect, it } from 'vitest';
import { projectMeanField } from '../../../models/projection/mean-field';
import { parseScenario } from '../../../shared/scenario/parse';
import { exampleJson, scenarioFrom, type LooseJson } from '../projection/fixtures';

// "Let it seed": one year in which the seed-set steps do not happen. Checks are facts of
// the life-cycle order (seed rain joins the seedbank at the end of the year it is shed),
// not numbers of our own.
describe('the let-it-seed year', () => {
  const base = scenarioFrom('demo-perennial-dock');
  const year = 5;
  const letIt = scenarioFrom('demo-perennial-dock', (j) => (j.letItSeedYear = year));
  const a = projectMeanField(base).series;
  const b = projectMeanField(letIt).series;

  it('changes nothing before that year', () => {
    for (let t = 0; t < year; t++) expect(b.seedbankTotal[t]).toBe(a.seedbankTotal[t]);
  });

  it('adds seed rain in that year and leaves a larger seedbank at its end', () => {
    expect(b.seedRain[year]).toBeGreaterThan(a.seedRain[year]);
    expect(b.seedbankTotal[year]).toBeGreaterThan(a.seedbankTotal[year]);
  });

  it('skips only seed-set steps: a strategy without them is unchanged', () => {
    const noSeedSet = (j: LooseJson) =>
      (j.strategy.steps = j.strategy.steps.filter((s: { kind: string }) => s.kind !== 'seed-set-prevention'));
    const plain = projectMeanField(scenarioFrom('demo-perennial-dock', noSeedSet)).series;
    const skipped = projectMeanField(
      scenarioFrom('demo-perennial-dock', (j) => (noSeedSet(j), (j.letItSeedYear = year))),
    ).series;
    expect(Array.from(skipped.seedbankTotal)).toEqual(Array.from(plain.seedbankTotal));
  });

  it('must lie inside the horizon', () => {
    const json = exampleJson('demo-perennial-dock');
    json.letItSeedYear = json.horizonYears + 1;
    const parsed = parseScenario(json);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues[0]).toMatchObject({ path: 'letItSeedYear' });
  });
});

describe('chemical details as entered', () => {
  it('accept an active ingredient without a rate, but not a rate without its unit', () => {
    const withChem = (chemical: object) => {
      const json = exampleJson('demo-perennial-dock');
      json.strategy.steps[2].chemical = chemical;
      return parseScenario(json);
    };
    expect(withChem({ activeIngredient: 'glyphosate' }).ok).toBe(true);
    expect(withChem({ activeIngredient: 'glyphosate', rate: 2, rateUnit: 'L/ha' }).ok).toBe(true);
    const bad = withChem({ activeIngredient: 'glyphosate', rate: 2 });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues[0].path).toBe('strategy.steps[2].chemical.rateUnit');
  });
});
