// Checks of the scenario schema against the product brief's requirements: every numeric
// field has a unit and a range, and invalid input fails with a message naming the field,
// the value and the allowed range; unknown keys and step kinds are rejected; schedule
// years must lie inside the horizon.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { issueText, parseScenario } from '../../../shared/scenario/parse';
import { parameterCatalogue } from '../../../shared/scenario/parameters';
import type { NumericParameter } from '../../../shared/scenario/parameters';
import { exampleJson } from '../../models/projection/fixtures';
import type { ExampleName, LooseJson } from '../../models/projection/fixtures';

const load = (name: ExampleName): LooseJson => exampleJson(name);
const demo = () => load('demo-perennial-dock');

function issuesOf(json: unknown) {
  const result = parseScenario(json);
  if (result.ok) throw new Error('expected the scenario to be rejected');
  return result.issues;
}

/** Every numeric leaf of a JSON value with its path, array indices written as []. */
function numericLeaves(value: unknown, path: string[] = []): string[] {
  if (typeof value === 'number') return [path.join('.')];
  if (Array.isArray(value))
    return value.flatMap((v) => numericLeaves(v, [...path.slice(0, -1), `${path[path.length - 1]}[]`]));
  if (value !== null && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => numericLeaves(v, [...path, k]));
  return [];
}

describe('scenario schema', () => {
  it('accepts the example scenarios', () => {
    for (const name of ['demo-perennial-dock', 'annual-goosefoot', 'lesson-seedbank-decay'] as const) {
      const result = parseScenario(load(name));
      expect(result.ok ? [] : result.issues.map(issueText)).toEqual([]);
    }
  });

  it('names field, value and range for an out-of-range fraction', () => {
    // The product brief's own example message.
    const s = demo();
    s.profile.seedDecay.shallow = 1.4;
    expect(issuesOf(s).map(issueText)).toEqual([
      'profile.seedDecay.shallow: 1.4 is outside 0–1 (fraction per year)',
    ]);
  });

  it('gives every numeric field of the examples a catalogue entry with unit and range', () => {
    // Product brief: "Every parameter field shows its meaning, unit, valid range and where its default came from".
    const keys = new Set(Object.keys(parameterCatalogue));
    const leaves = (['demo-perennial-dock', 'annual-goosefoot'] as const).flatMap((n) =>
      numericLeaves(load(n)),
    );
    // Schedules and efficacies are unions; their members are catalogued under the shared prefix.
    const missing = leaves.filter(
      (leaf) => !keys.has(leaf.replace(/^strategy\.steps\[\]/, 'strategy.steps[]')),
    );
    expect(missing).toEqual([]);
    for (const p of Object.values(parameterCatalogue) as NumericParameter[]) {
      expect(p.unit.length).toBeGreaterThan(0);
      expect(p.defaultSource.length).toBeGreaterThan(0);
      if (p.default !== null) expect(p.default >= p.min && p.default <= p.max).toBe(true);
    }
  });

  it('rejects any value outside the range of a fraction field, naming it', () => {
    // Fractions are probabilities: outside [0, 1] is meaningless (definition of a probability).
    const paths: [string[], string][] = [
      [['profile', 'germination', 'deep'], 'profile.germination.deep'],
      [['profile', 'establishment', 'survival'], 'profile.establishment.survival'],
      [['field', 'cropCompetition'], 'field.cropCompetition'],
      [['profile', 'rootCrownRegrowth'], 'profile.rootCrownRegrowth'],
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...paths),
        fc.oneof(
          fc.double({ min: 1.000001, max: 1e6, noNaN: true }),
          fc.double({ min: -1e6, max: -1e-9, noNaN: true }),
        ),
        ([path, name], bad) => {
          const s = demo();
          let target = s;
          for (const key of path.slice(0, -1)) target = target[key];
          target[path[path.length - 1]] = bad;
          const issues = issuesOf(s);
          expect(issues).toHaveLength(1);
          expect(issues[0].path).toBe(name);
          expect(issues[0].message).toContain(String(bad));
          expect(issues[0].message).toContain('0–1');
        },
      ),
      { seed: 42, numRuns: 60 },
    );
  });

  it('rejects unknown keys and unknown step kinds', () => {
    const s = demo();
    s.profile.colour = 'green';
    s.strategy.steps[0].kind = 'flame-weeding';
    const issues = issuesOf(s);
    expect(issues.map((i) => i.path).sort()).toEqual(['profile.colour', 'strategy.steps[0].kind']);
    expect(issues.find((i) => i.path === 'strategy.steps[0].kind')?.message).toContain(
      '"flame-weeding" is not a step kind',
    );
  });

  it('rejects whole-number fields given fractions, and missing fields', () => {
    const s = demo();
    s.replicates = 2.5;
    delete s.field.areaHa;
    const texts = issuesOf(s).map(issueText);
    expect(texts).toContain('replicates: 2.5 is not a whole number (runs)');
    expect(texts.some((t) => t.startsWith('field.areaHa: is required') && t.includes('ha'))).toBe(true);
  });

  it('rejects schedule years outside the horizon', () => {
    const s = demo();
    s.horizonYears = 10;
    s.strategy.steps[0].schedule = { kind: 'year-range', first: 2, last: 11 };
    s.strategy.steps[2].schedule = { kind: 'every-k-years', k: 3, start: 12 };
    expect(issuesOf(s).map(issueText).sort()).toEqual([
      'strategy.steps[0].schedule.last: year 11 is outside the horizon 1–10 (years)',
      'strategy.steps[2].schedule.start: year 12 is outside the horizon 1–10 (years)',
    ]);
  });

  it('rejects timings and targets the life cycle cannot honour', () => {
    // Model brief: pre-emergence steps act on emerging seedlings; plants flower after the spring steps.
    const s = demo();
    s.strategy.steps[0].targets = ['flowering'];
    s.strategy.steps[1].timing = 'spring';
    const paths = issuesOf(s)
      .map((i) => i.path)
      .sort();
    expect(paths).toEqual(['strategy.steps[0].targets[0]', 'strategy.steps[1].timing']);
  });

  it('rejects an efficacy spread no distribution on 0–1 can have', () => {
    // Any distribution on [0, 1] with mean m has variance at most m(1 − m) (Bhatia–Davis inequality,
    // Bhatia & Davis 2000, Amer. Math. Monthly 107: 353–357): sd 0.4 at mean 0.9 is impossible.
    const s = demo();
    s.strategy.steps[0].efficacy = { mean: 0.9, sd: 0.4 };
    s.strategy.steps[1].efficacy = { min: 0.9, mode: 0.8, max: 0.95 };
    const paths = issuesOf(s)
      .map((i) => i.path)
      .sort();
    expect(paths).toEqual(['strategy.steps[0].efficacy.sd', 'strategy.steps[1].efficacy']);
  });

  it('requires an annual to have zero over-winter survival', () => {
    // Model brief: over-winter survival of established plants is 0 for an annual.
    const s = load('annual-goosefoot');
    s.profile.overWinterSurvival = 0.3;
    expect(issuesOf(s).map((i) => i.path)).toEqual(['profile.overWinterSurvival']);
  });

  it('keeps chemical details as entered and never fills them in', () => {
    // Model brief: the active ingredient, rate and unit are as entered; the product never invents rates.
    const s = load('annual-goosefoot');
    const parsed = parseScenario(s);
    expect(parsed.ok && 'chemical' in parsed.scenario.strategy.steps[0]).toBe(false);
    s.strategy.steps[0].chemical = { activeIngredient: 'as on my label', rate: 1.25, rateUnit: 'L/ha' };
    const again = parseScenario(s);
    expect(again.ok && again.scenario.strategy.steps[0]).toMatchObject({
      chemical: { activeIngredient: 'as on my label', rate: 1.25, rateUnit: 'L/ha' },
    });
    s.strategy.steps[0].chemical = { activeIngredient: 'x', rate: 0, rateUnit: 'L/ha' };
    expect(issuesOf(s).map(issueText)).toEqual([
      'strategy.steps[0].chemical.rate: 0 must be above 0 (in the rate unit entered)',
    ]);
  });
});
