// The demo's lesson and species cards are inserted without going through the API, so they
// are checked here against the same schemas the API validates with.
import { describe, expect, it } from 'vitest';
import { lessonBody } from '../../../../shared/api/lessons';
import { speciesCardBody } from '../../../../shared/api/species-cards';
import { demoCards, demoLesson } from '../../../../server/db/seed/demo-lessons';

describe('the demo teaching material', () => {
  it('has a valid seedbank-decay lesson whose axis reaches at least 40 years', () => {
    const { id: _id, ...body } = demoLesson;
    const parsed = lessonBody.parse(body);
    expect(parsed.definition.template).toBe('seedbank-decay');
    // Common practice, no published source: dock seed stays viable in soil for more than 40 years.
    expect(parsed.definition.settings.horizonYears).toBeGreaterThanOrEqual(40);
  });

  it('tells the invented dock from its look-alike by leaf width and a wavy leaf margin, row by row', () => {
    // Common practice, no published source: two docks of one genus are told apart mainly by
    // leaf width and a wavy leaf margin.
    const bodyOf = ({ id: _id, profileId: _profileId, ...card }: (typeof demoCards)[number]) => card;
    const dock = speciesCardBody.parse(bodyOf(demoCards[0]));
    const byFeature = Object.fromEntries(dock.lookAlikes.map((r) => [r.feature.toLowerCase(), r]));
    for (const feature of ['leaf width', 'leaf margin']) {
      expect(byFeature[feature]).toBeDefined();
      expect(byFeature[feature].thisSpecies).not.toBe(byFeature[feature].lookAlike);
    }
    expect(byFeature['leaf margin'].lookAlike).toMatch(/wavy/i);
    expect(byFeature['leaf width'].thisSpecies).toMatch(/broad/i);
    expect(byFeature['leaf width'].lookAlike).toMatch(/narrow/i);
    for (const card of demoCards) expect(speciesCardBody.safeParse(bodyOf(card)).success).toBe(true);
  });
});
