import type { ReactNode } from 'react';
import type { FieldBody, FieldView } from '../../../../shared/api/fields';
import { SaveBar } from '../../shared/components/SaveBar';
import { FormAlert } from '../../shared/components/FormAlert';
import { InvalidSummary } from '../../shared/components/InvalidSummary';
import { ParameterField } from '../../shared/components/ParameterField';
import { TextAreaField } from '../../shared/components/TextAreaField';
import { TextField } from '../../shared/components/TextField';
import { useDraftForm } from '../../shared/lib/draftForm';
import { conversion, formatNumber, type NumberDraft } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { buildField, catalogueKey, type FieldDraft, type FieldNumberKey } from './fieldDraft';

type FieldEditorProps = {
  initial: FieldDraft;
  editable: boolean;
  onSave: (body: FieldBody) => Promise<FieldView>;
  saving: boolean;
  saveError: unknown;
  actions?: ReactNode;
};

/** Cousens (1985) rectangular hyperbola: % yield loss = I·D / (1 + I·D/A) at D plants/m². */
const yieldLoss = (I: number, A: number, D: number) => (I * D) / (1 + (I * D) / A);

export function FieldEditor({ initial, editable, onSave, saving, saveError, actions }: FieldEditorProps) {
  const form = useDraftForm(initial, buildField);
  const { draft, built, edit, errorAt, formRef, savedAt } = form;
  const { system } = useUnits();

  const number = (key: FieldNumberKey) => (
    <ParameterField
      parameter={catalogueKey(key)}
      draft={draft.numbers[key]}
      onChange={(value: NumberDraft) =>
        edit(`setting.${key}`, (d) => ({ ...d, numbers: { ...d.numbers, [key]: value } }))
      }
      error={errorAt(`setting.${key}`)}
      readOnly={!editable}
    />
  );
  const text = (path: 'name' | 'crop' | 'plantingYear', errorPath: string) => ({
    name: errorPath,
    value: draft[path],
    error: errorAt(errorPath),
    onChange: (event: { target: { value: string } }) => {
      const value = event.target.value;
      edit(errorPath, (d) => ({ ...d, [path]: value }));
    },
  });

  const setting = built.body?.setting;
  const density = conversion('seeds/m²', system);
  const plants = conversion('plants/m²', system);

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        if (!saving) void form.submit(onSave);
      }}
      aria-label={`Field ${draft.name || '(unnamed)'}`}
      className="flex flex-col gap-6"
    >
      <InvalidSummary
        show={form.showingAll && Object.keys(form.serverErrors).length === 0}
        count={Object.keys(built.errors).length}
        what="the field"
      />
      <FormAlert error={saveError} />

      <Section title="The field" lead="What it is called, what grows on it, and how big it is.">
        {editable ? (
          <div className="grid gap-4 pb-4 sm:grid-cols-2">
            <TextField label="Field name" required {...text('name', 'setting.name')} />
            <TextField
              label="Crop"
              required
              hint="As you call it, e.g. raspberry."
              {...text('crop', 'crop')}
            />
            <TextField
              label="Planting year"
              inputMode="numeric"
              hint="The year the crop was planted."
              {...text('plantingYear', 'plantingYear')}
            />
          </div>
        ) : (
          <dl className="grid gap-x-6 gap-y-2 pb-4 sm:grid-cols-3">
            <Fact label="Field name" value={draft.name} />
            <Fact label="Crop" value={draft.crop} />
            <Fact label="Planting year" value={draft.plantingYear || '—'} />
          </dl>
        )}
        {number('areaHa')}
        <div className="border-t border-silt-200 pt-4">
          {editable ? (
            <TextAreaField
              label="Notes"
              name="notes"
              value={draft.notes}
              maxLength={5000}
              error={errorAt('notes')}
              hint="Where the weed grows, what was done before, anything the next person should know."
              onChange={(event) => {
                const notes = event.target.value;
                edit('notes', (d) => ({ ...d, notes }));
              }}
            />
          ) : (
            <dl>
              <Fact label="Notes" value={draft.notes || '—'} />
            </dl>
          )}
        </div>
      </Section>

      <Section
        title="At the first census"
        lead="Late winter, before emergence: what soil cores and plant counts found."
        aside={
          setting ? (
            <div className="overflow-hidden rounded-seed text-sm" aria-hidden="true">
              <div className="bg-humus-800 px-3 py-1 text-xs text-silt-100">surface</div>
              <div className="bg-loam-600 px-3 py-2 text-silt-50">
                Shallow {formatNumber(density.toShown(setting.initialSeedbank.shallow), 1)} {density.unit}
              </div>
              <div className="bg-clay-500 px-3 py-2 text-humus-900">
                Deep {formatNumber(density.toShown(setting.initialSeedbank.deep), 1)} {density.unit}
              </div>
            </div>
          ) : null
        }
      >
        {number('initialSeedbank.shallow')}
        {number('initialSeedbank.deep')}
        {number('initialPlants')}
        {number('immigrantSeedRain')}
      </Section>

      <Section
        title="Crop value and yield loss"
        lead="What the crop is worth and how weeds cut it, for costs and net present value."
        aside={
          setting ? (
            <p className="rounded-seed bg-silt-100 p-3 text-sm text-humus-900">
              At the first census’s {formatNumber(plants.toShown(setting.initialPlants), 2)} {plants.unit},
              the crop would lose{' '}
              <span className="font-semibold">
                {formatNumber(yieldLoss(setting.yieldLoss.I, setting.yieldLoss.A, setting.initialPlants), 1)}%
              </span>{' '}
              of its yield (Cousens 1985 hyperbola).
            </p>
          ) : null
        }
      >
        {number('cropValuePerHa')}
        {number('yieldLoss.I')}
        {number('yieldLoss.A')}
        {number('cropCompetition')}
      </Section>

      <SaveBar editable={editable} actions={actions} saving={saving} savedAt={savedAt} label="Save field" />
    </form>
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-sm text-loam-700">{label}</dt>
      <dd className="font-medium whitespace-pre-line">{value}</dd>
    </div>
  );
}

function Section({
  title,
  lead,
  aside,
  children,
}: {
  title: string;
  lead: string;
  aside?: ReactNode;
  children: ReactNode;
}) {
  const id = `section-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;
  return (
    <section
      aria-labelledby={id}
      className="overflow-hidden rounded-seed border border-silt-300 bg-white shadow-sheet"
    >
      <header className="flex flex-wrap items-start justify-between gap-4 border-b border-silt-300 bg-silt-100 px-5 py-3 sm:px-6">
        <div>
          <h2 id={id} className="text-xl font-semibold">
            {title}
          </h2>
          <p className="text-sm text-loam-700">{lead}</p>
        </div>
        {aside ? <div className="w-full sm:w-72">{aside}</div> : null}
      </header>
      <div className="flex flex-col px-5 py-4 sm:px-6">{children}</div>
    </section>
  );
}
