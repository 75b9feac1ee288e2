// The demo's teaching material: a seedbank-decay lesson by the farm's extension educator
// and species cards for the two invented built-in species. Every name and description
// here is invented for the demo; no photos are seeded.
import { eq } from 'drizzle-orm';
import type { LessonDefinition } from '../../../shared/api/lessons';
import type { LookAlikeRow } from '../../../shared/api/species-cards';
import type { Database } from '../client';
import { lessons, speciesCards } from '../schema-lessons';
import { builtInProfiles } from './demo-library';
import { demoPeople, demoWorkspace } from './demo-people';

const id = (n: number) => `5eedfa00-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
const [dock, goosefoot] = builtInProfiles;
const teacher = demoPeople.find((p) => p.email.startsWith('teacher@'))!;

const slider = (value: number, max = 0.5) => ({ min: 0, max, step: 0.01, value });

const decayLesson: LessonDefinition = {
  template: 'seedbank-decay',
  settings: {
    // Dock seed can stay viable in the soil for more than 40 years (common practice, no
    // published source), so the lesson's axis runs to 50.
    horizonYears: 50,
    initialSeedbank: 1000,
    scale: 'linear',
    replicates: 200,
    seed: 2026,
    sliders: {
      decay: slider(0.12),
      germination: slider(0.06),
      compareDecay: slider(0.04),
      compareGermination: slider(0),
    },
  },
};

export const demoLesson = {
  id: id(0x601),
  title: 'Why 95 % control keeps failing: the seedbank',
  profileId: dock.id,
  definition: decayLesson,
  prompts: [
    'Cohort A is seed near the **surface**, cohort B seed that a cultivation **buried**. Before you move anything: which cohort is still there after 20 years?',
    'Set germination to 0 for cohort A. What happens to its half-life, and why does seed that never germinates still disappear?',
    'A program kills 95 % of the plants every year. Using the half-life on this page, how many years of *perfect* seed-set prevention would it take to run the seedbank down to 1 %?',
  ],
};

// Invented look-alikes. The features are the trade's: two docks of one genus are told apart
// mainly by leaf width and a wavy leaf margin (common practice, no published source).
const dockLookAlikes: LookAlikeRow[] = [
  {
    feature: 'Leaf width',
    thisSpecies: 'Broad basal leaves, roughly a third as wide as they are long',
    lookAlike: 'Narrow, strap-like basal leaves, five or more times as long as wide',
    lookAlikeName: 'Ribbon dock (invented)',
  },
  {
    feature: 'Leaf margin',
    thisSpecies: 'Flat or only gently undulating edge',
    lookAlike: 'Strongly wavy, crimped edge along the whole blade',
    lookAlikeName: 'Ribbon dock (invented)',
  },
  {
    feature: 'Leaf base',
    thisSpecies: 'Rounded to heart-shaped where the blade meets the stalk',
    lookAlike: 'Tapering gradually into the stalk',
    lookAlikeName: 'Ribbon dock (invented)',
  },
];

const goosefootLookAlikes: LookAlikeRow[] = [
  {
    feature: 'Leaf surface',
    thisSpecies: 'Mealy white coating, heaviest on young leaves',
    lookAlike: 'Green and glossy, no coating',
    lookAlikeName: 'Shiny orache (invented)',
  },
  {
    feature: 'Leaf shape',
    thisSpecies: 'Diamond-shaped with a few shallow teeth',
    lookAlike: 'Arrow-shaped with two spreading lobes at the base',
    lookAlikeName: 'Shiny orache (invented)',
  },
];

export const demoCards = [
  {
    id: id(0x701),
    profileId: dock.id,
    identificationNotes:
      'An invented perennial dock of berry rows and irrigation lines. Rosettes of broad, dark leaves in spring; a stout reddish flowering stem by midsummer, with dense clusters of winged seed that turn rust-brown as they ripen. A thick taproot with a root crown just below the surface: plants cut off above the crown regrow.',
    lookAlikes: dockLookAlikes,
    lifeForm: 'Perennial with a taproot; regrows from the root crown',
    status: 'Invented demo species: introduced and weedy in the demo region',
  },
  {
    id: id(0x702),
    profileId: goosefoot.id,
    identificationNotes:
      'An invented annual of cultivated alleys. Seedlings have narrow seed leaves and a mealy sheen; plants branch from the base and carry small green flower clusters in dense spikes from late summer.',
    lookAlikes: goosefootLookAlikes,
    lifeForm: 'Summer annual',
    status: 'Invented demo species: native to the demo region',
  },
];

/** Adds the demo lesson and cards unless they are there; returns how many rows it added. */
export async function seedTeaching(db: Database, now: Date): Promise<number> {
  let added = 0;
  const [lesson] = await db.select({ id: lessons.id }).from(lessons).where(eq(lessons.id, demoLesson.id));
  if (!lesson) {
    await db.insert(lessons).values({
      ...demoLesson,
      workspaceId: demoWorkspace.id,
      template: demoLesson.definition.template,
      createdBy: teacher.id,
      createdAt: now,
      updatedAt: now,
    });
    added++;
  }
  for (const card of demoCards) {
    const [row] = await db
      .select({ id: speciesCards.id })
      .from(speciesCards)
      .where(eq(speciesCards.id, card.id));
    if (row) continue;
    await db
      .insert(speciesCards)
      .values({ ...card, workspaceId: demoWorkspace.id, createdAt: now, updatedAt: now });
    added++;
  }
  return added;
}
