import type { ReactNode } from 'react';
import type { ProfileBody, ProfileView } from '../../../../shared/api/profiles';
import { parameterCatalogue } from '../../../../shared/scenario/parameters';
import type { LifeForm } from '../../../../models/scenario/types';
import { Button } from '../../shared/components/Button';
import { SaveBar } from '../../shared/components/SaveBar';
import { FormAlert } from '../../shared/components/FormAlert';
import { InvalidSummary } from '../../shared/components/InvalidSummary';
import { ParameterField, SourceNoteInput } from '../../shared/components/ParameterField';
import { TextField } from '../../shared/components/TextField';
import { useDraftForm } from '../../shared/lib/draftForm';
import { draftOf, type NumberDraft } from '../../shared/lib/parameterDraft';
import { DecayPreview } from './DecayPreview';
import {
  buildProfile,
  catalogueKey,
  SHALLOW_BY_AGE,
  type DensityKind,
  type ProfileDraft,
  type ScalarKey,
} from './profileDraft';

const lifeForms: { value: LifeForm; label: string; detail: string }[] = [
  {
    value: 'annual',
    label: 'Annual',
    detail: 'Emerges, flowers and dies within one year; lives on as seed.',
  },
  {
    value: 'biennial',
    label: 'Biennial',
    detail: 'A rosette in its first year, flowers and dies in its second.',
  },
  {
    value: 'perennial',
    label: 'Perennial',
    detail: 'Lives for years and regrows from the root crown after its shoots are removed.',
  },
];

const densityKinds: [DensityKind, string][] = [
  ['beverton-holt', 'Gradual crowding (Beverton–Holt)'],
  ['ceiling', 'A ceiling of plants per area'],
];

type ProfileEditorProps = {
  initial: ProfileDraft;
  /** False for a viewer and for built-in profiles: everything shows, nothing can change. */
  editable: boolean;
  /** Saves the body; resolves to the saved view, or rejects with the server's error. */
  onSave: (body: ProfileBody) => Promise<ProfileView>;
  saving: boolean;
  saveError: unknown;
  /** Extra actions beside Save (delete), or in place of it (copy to edit). */
  actions?: ReactNode;
};

/**
 * The species profile editor: grouped parameters, each with its meaning, unit, valid
 * range, default and the person's own source note, and beside them an instant preview of
 * seedbank decay computed in the browser as they type.
 */
export function ProfileEditor({ initial, editable, onSave, saving, saveError, actions }: ProfileEditorProps) {
  const form = useDraftForm(initial, buildProfile);
  const { draft, built, edit, errorAt, formRef, savedAt } = form;

  const setNumber = (key: ScalarKey) => (value: NumberDraft) =>
    edit(`profile.${key}`, (d) => ({ ...d, numbers: { ...d.numbers, [key]: value } }));
  const sourceFor = (key: string) =>
    editable
      ? {
          value: draft.sources[key] ?? '',
          onChange: (note: string) =>
            edit(`sources.${key}`, (d) => ({ ...d, sources: { ...d.sources, [key]: note } })),
          error: errorAt(`sources.${key}`),
        }
      : undefined;

  const scalar = (key: ScalarKey, optional = false) => (
    <ParameterField
      key={key}
      parameter={catalogueKey(key)}
      draft={draft.numbers[key]}
      onChange={setNumber(key)}
      error={errorAt(`profile.${key}`)}
      optional={optional}
      source={sourceFor(key)}
      readOnly={!editable}
      readOnlySource={draft.sources[key]}
    />
  );

  const submit = () => {
    if (saving) return;
    void form.submit(onSave);
  };

  const invalidCount = Object.keys(built.errors).length;
  const ageClasses = Number(draft.numbers.ageClasses.text) || 1;
  const byAge = parameterCatalogue['profile.germination.shallowByAge[]'];

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
      aria-label={`Species profile ${draft.name || '(unnamed)'}`}
      className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_26rem] lg:items-start"
    >
      <div className="flex flex-col gap-6">
        <InvalidSummary
          show={form.showingAll && Object.keys(form.serverErrors).length === 0}
          count={invalidCount}
          what="the profile"
        />
        <FormAlert error={saveError} />

        <Group
          title="Life form"
          lead="The name this profile goes by and how the weed lives from year to year."
        >
          {editable ? (
            <TextField
              label="Profile name"
              name="profile.name"
              required
              value={draft.name}
              onChange={(event) => {
                const name = event.target.value;
                edit('profile.name', (d) => ({ ...d, name }));
              }}
              error={errorAt('profile.name')}
              hint="E.g. “Dock, Hollow Lane cores 2025”."
            />
          ) : null}
          {editable ? (
            <fieldset className="mt-4 flex flex-col gap-2">
              <legend className="font-medium text-humus-900">Life form</legend>
              <div className="grid gap-2 sm:grid-cols-3">
                {lifeForms.map((form) => (
                  <label
                    key={form.value}
                    className={`flex cursor-pointer gap-2 rounded-seed border p-3 text-sm hover:border-loam-600 ${
                      draft.lifeForm === form.value ? 'border-humus-900 bg-silt-100' : 'border-silt-300'
                    }`}
                  >
                    <input
                      type="radio"
                      name="lifeForm"
                      value={form.value}
                      checked={draft.lifeForm === form.value}
                      onChange={() => edit('profile.lifeForm', (d) => ({ ...d, lifeForm: form.value }))}
                      className="mt-1 accent-humus-900"
                    />
                    <span>
                      <span className="block font-medium text-humus-900">{form.label}</span>
                      <span className="text-loam-700">{form.detail}</span>
                    </span>
                  </label>
                ))}
              </div>
            </fieldset>
          ) : (
            <ReadOnlyChoice
              label="Life form"
              value={lifeForms.find((f) => f.value === draft.lifeForm)?.label ?? draft.lifeForm}
              detail={lifeForms.find((f) => f.value === draft.lifeForm)?.detail}
            />
          )}
        </Group>

        <Group
          title="Seed production"
          lead="How many seeds a flowering plant sets, and how crowding and chance spread them."
        >
          {scalar('fecundity.maxSeedsPerPlant')}
          {scalar('fecundity.densityCoefficient')}
          {scalar('fecundity.aggregation', true)}
        </Group>

        <Group
          title="Germination by layer and age"
          lead="Seeds emerge from the shallow layer, at a rate that can change with their age; from the deep layer they hardly emerge."
        >
          {scalar('ageClasses')}
          <fieldset className="flex flex-col gap-1 border-t border-silt-200 pt-4">
            <legend className="font-medium text-humus-900">{byAge.label}</legend>
            <p className="text-sm text-loam-700">{byAge.meaning}</p>
            {errorAt(`profile.${SHALLOW_BY_AGE}`) ? (
              <p className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
                <span aria-hidden="true">✕</span>
                <span>Germination by age {errorAt(`profile.${SHALLOW_BY_AGE}`)}</span>
              </p>
            ) : null}
            <div className="mt-2 flex flex-col">
              {draft.shallowByAge.map((entry, i) => (
                <ParameterField
                  key={i}
                  parameter="profile.germination.shallowByAge[]"
                  label={
                    i === draft.shallowByAge.length - 1 && i < ageClasses - 1
                      ? `Age class ${i} and older`
                      : `Age class ${i}${i === 0 ? ' (shed last year)' : ''}`
                  }
                  meaning={
                    i === 0 ? undefined : `Fraction of shallow seeds of age ${i} that emerge in a year.`
                  }
                  draft={entry}
                  onChange={(value) =>
                    edit(`profile.${SHALLOW_BY_AGE}[${i}]`, (d) => ({
                      ...d,
                      shallowByAge: d.shallowByAge.map((e, j) => (j === i ? value : e)),
                    }))
                  }
                  error={errorAt(`profile.${SHALLOW_BY_AGE}[${i}]`)}
                  readOnly={!editable}
                />
              ))}
            </div>
            {editable ? (
              <div className="flex flex-wrap gap-2">
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() =>
                    edit(`profile.${SHALLOW_BY_AGE}`, (d) => ({
                      ...d,
                      shallowByAge: [...d.shallowByAge, d.shallowByAge.at(-1) ?? draftOf(byAge.default)],
                    }))
                  }
                >
                  Add an age class
                </Button>
                {draft.shallowByAge.length > 1 ? (
                  <Button
                    size="sm"
                    variant="quiet"
                    onClick={() =>
                      edit(`profile.${SHALLOW_BY_AGE}`, (d) => ({
                        ...d,
                        shallowByAge: d.shallowByAge.slice(0, -1),
                      }))
                    }
                  >
                    Remove the last age class
                  </Button>
                ) : null}
              </div>
            ) : null}
            {editable ? (
              <SourceNoteInput label="Source of the germination values" {...sourceFor(SHALLOW_BY_AGE)!} />
            ) : draft.sources[SHALLOW_BY_AGE] ? (
              <p className="text-sm text-loam-700">Source: {draft.sources[SHALLOW_BY_AGE]}</p>
            ) : null}
          </fieldset>
          {scalar('germination.deep')}
        </Group>

        <Group
          title="Seed decay by layer"
          lead="Viable seeds lost each year in each layer; burial often slows decay."
        >
          {scalar('seedDecay.shallow')}
          {scalar('seedDecay.deep')}
        </Group>

        <Group
          title="Establishment and crowding"
          lead="Of the seedlings that emerge, how many become established plants, and how crowding limits them."
        >
          {scalar('establishment.survival')}
          {editable ? (
            <fieldset className="flex flex-col gap-2 border-t border-silt-200 py-4">
              <legend className="mb-2 font-medium text-humus-900">How crowding limits establishment</legend>
              <div className="flex flex-wrap gap-4">
                {densityKinds.map(([kind, label]) => (
                  <label key={kind} className="flex items-center gap-2 text-sm">
                    <input
                      type="radio"
                      name="densityKind"
                      value={kind}
                      checked={draft.densityKind === kind}
                      onChange={() =>
                        edit('profile.establishment.density', (d) => ({ ...d, densityKind: kind }))
                      }
                      className="accent-humus-900"
                    />
                    {label}
                  </label>
                ))}
              </div>
            </fieldset>
          ) : (
            <ReadOnlyChoice
              label="How crowding limits establishment"
              value={densityKinds.find(([kind]) => kind === draft.densityKind)?.[1] ?? draft.densityKind}
            />
          )}
          {draft.densityKind === 'beverton-holt'
            ? scalar('establishment.density.c')
            : scalar('establishment.density.K')}
        </Group>

        <Group
          title="Survival, flowering and regrowth"
          lead="What happens to established plants: flowering, the winter, shoots removed, roots cut."
        >
          {scalar('floweringProbability')}
          {scalar('overWinterSurvival')}
          {scalar('rootCrownRegrowth')}
          {scalar('fragmentEstablishment')}
        </Group>

        <Group title="Seed-rain loss" lead="Shed seed that never reaches the seedbank.">
          {scalar('seedRainLoss')}
        </Group>

        <Group
          title="Year-to-year variation"
          lead="Weather makes some years better for the weed than others; these set how much the stochastic projections vary."
        >
          {scalar('environment.germinationCv')}
          {scalar('environment.establishmentCv')}
          {scalar('environment.fecundityCv')}
        </Group>

        <SaveBar
          editable={editable}
          actions={actions}
          saving={saving}
          savedAt={savedAt}
          label="Save profile"
          className="-mx-1 px-1"
        />
      </div>

      <aside
        aria-labelledby="decay-preview-title"
        className="rounded-seed border border-silt-300 bg-white p-5 shadow-sheet lg:sticky lg:top-4"
      >
        <h2 id="decay-preview-title" className="text-xl font-semibold">
          Seedbank decay preview
        </h2>
        <p className="mt-1 mb-3 text-sm text-loam-700">Updates as you type.</p>
        <DecayPreview profile={built.body?.profile ?? null} />
      </aside>
    </form>
  );
}

function Group({ title, lead, children }: { title: string; lead: string; children: ReactNode }) {
  const id = `group-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;
  return (
    <section
      aria-labelledby={id}
      className="overflow-hidden rounded-seed border border-silt-300 bg-white shadow-sheet"
    >
      <header className="border-b border-silt-300 bg-silt-100 px-5 py-3 sm:px-6">
        <h2 id={id} className="text-xl font-semibold">
          {title}
        </h2>
        <p className="text-sm text-loam-700">{lead}</p>
      </header>
      <div className="flex flex-col px-5 py-4 sm:px-6">{children}</div>
    </section>
  );
}

function ReadOnlyChoice({ label, value, detail }: { label: string; value: string; detail?: string }) {
  return (
    <div className="border-t border-silt-200 py-4 first:border-t-0 first:pt-0">
      <p className="font-medium text-humus-900">{label}</p>
      <p className="mt-1">
        <span className="rounded-seed bg-silt-100 px-2 py-1 font-medium">{value}</span>
        {detail ? <span className="ml-2 text-sm text-loam-700">{detail}</span> : null}
      </p>
    </div>
  );
}
