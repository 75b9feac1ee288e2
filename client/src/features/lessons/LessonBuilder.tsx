import { useEffect, useId, useRef, useState } from 'react';
import type { LessonBody, LessonView } from '../../../../shared/api/lessons';
import {
  lessonTemplates,
  templateSpecs,
  type LessonTemplate,
  type SliderSpec,
} from '../../../../shared/lessons/templates';
import { parameterCatalogue } from '../../../../shared/scenario/parameters';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { Panel } from '../../shared/components/Panel';
import { ParameterField } from '../../shared/components/ParameterField';
import { SelectField } from '../../shared/components/SelectField';
import { TextAreaField } from '../../shared/components/TextAreaField';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors } from '../../shared/lib/forms';
import { conversion, shownText, typedDraft, type NumberDraft } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { buildBody, fixedKeysOf, fixedSettings, type BuilderDraft, type SliderDraft } from './builderDraft';

export type ProfileOption = { id: string; name: string };

type LessonBuilderProps = {
  initial: BuilderDraft;
  profiles: readonly ProfileOption[];
  onSave: (body: LessonBody) => Promise<LessonView>;
  saving: boolean;
  saveError: unknown;
  submitLabel: string;
};

const fixedMeaning = (template: LessonTemplate): Partial<Record<keyof typeof fixedSettings, string>> => {
  const h = templateSpecs[template].horizon;
  return {
    horizonYears:
      template === 'seedbank-decay'
        ? `Years on the lesson's axis: ${h.min}–${h.max} here. Buried seed can stay viable for more than 40 years (common practice, no published source), so the axis reaches at least ${h.min}.`
        : `Years on the lesson's axis: ${h.min}–${h.max} here.`,
    replicates: 'Runs with chance in one “Replay with chance”: 10–200 here, so a replay stays quick.',
    initialSeedbank: 'Viable seeds per m² at the start of the lesson, all in the top layer.',
    initialPlants: 'Established plants per m² at the start of the lesson.',
  };
};

/**
 * The teacher's lesson builder: pick a template and (where it needs one) a species
 * profile, fix each slider's range, step and starting value, set the axis and the replay,
 * and write the prompts in Markdown.
 */
export function LessonBuilder({
  initial,
  profiles,
  onSave,
  saving,
  saveError,
  submitLabel,
}: LessonBuilderProps) {
  const [draft, setDraft] = useState(initial);
  const [attempted, setAttempted] = useState(false);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const [failures, setFailures] = useState(0);
  const formRef = useRef<HTMLFormElement>(null);
  const spec = templateSpecs[draft.template];
  const own = draft.settings[draft.template];
  const serverErrors = serverFieldErrors(saveError);
  const errorAt = (path: string) => (attempted ? localErrors[path] : undefined) ?? serverErrors[path];

  useEffect(() => {
    if (failures === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [failures]);

  const setOwn = (
    change: (d: BuilderDraft['settings'][LessonTemplate]) => BuilderDraft['settings'][LessonTemplate],
  ) => setDraft((d) => ({ ...d, settings: { ...d.settings, [d.template]: change(d.settings[d.template]) } }));

  const submit = () => {
    setAttempted(true);
    const built = buildBody(draft);
    setLocalErrors(built.errors);
    if (!built.body) {
      setFailures((n) => n + 1);
      return;
    }
    onSave(built.body).catch(() => setFailures((n) => n + 1));
  };

  const profileOptions = [
    {
      value: '',
      label: spec.needsProfile ? '— pick a species profile —' : 'None (the lesson needs no profile)',
    },
    ...profiles.map((p) => ({ value: p.id, label: p.name })),
  ];
  const meanings = fixedMeaning(draft.template);

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
      className="flex flex-col gap-6"
    >
      <Panel>
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-2 font-display text-2xl font-semibold">Template</legend>
          <div className="grid gap-3 md:grid-cols-2">
            {lessonTemplates.map((t) => (
              <label
                key={t}
                className="flex cursor-pointer gap-3 rounded-seed border border-silt-300 p-4 has-checked:border-humus-900 has-checked:bg-silt-100 has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-clay-600"
              >
                <input
                  type="radio"
                  name="template"
                  value={t}
                  checked={draft.template === t}
                  onChange={() => setDraft((d) => ({ ...d, template: t }))}
                  className="mt-1 accent-humus-900"
                />
                <span className="flex flex-col gap-1">
                  <span className="font-semibold text-humus-900">{templateSpecs[t].name}</span>
                  <span className="text-sm text-loam-700">{templateSpecs[t].summary}</span>
                </span>
              </label>
            ))}
          </div>
        </fieldset>
      </Panel>

      <Panel className="flex flex-col gap-4">
        <h2 className="text-2xl font-semibold">The lesson</h2>
        <TextField
          label="Title"
          name="title"
          required
          value={draft.title}
          onChange={(e) => setDraft((d) => ({ ...d, title: e.target.value }))}
          error={errorAt('title')}
          hint="What the class sees at the top of the page."
        />
        <SelectField
          label="Species profile"
          name="profileId"
          value={draft.profileId}
          onChange={(e) => setDraft((d) => ({ ...d, profileId: e.target.value }))}
          options={profileOptions}
          error={errorAt('profileId')}
          hint={
            spec.needsProfile
              ? 'The lesson runs on this profile’s parameters; its species card appears on the lesson.'
              : 'Optional: its species card appears on the lesson.'
          }
        />
      </Panel>

      <Panel className="flex flex-col gap-2">
        <h2 className="text-2xl font-semibold">Axis and replay</h2>
        {fixedKeysOf(draft.template).map((key) => (
          <ParameterField
            key={`${draft.template}-${key}`}
            parameter={fixedSettings[key]}
            draft={own.fixed[key]}
            onChange={(d) => setOwn((o) => ({ ...o, fixed: { ...o.fixed, [key]: d } }))}
            meaning={meanings[key]}
            error={errorAt(`definition.settings.${key}`)}
          />
        ))}
        {draft.template === 'seedbank-decay' ? (
          <fieldset className="flex flex-wrap items-center gap-4 border-t border-silt-200 pt-4">
            <legend className="sr-only">Axis scale at the start</legend>
            <span className="font-medium text-humus-900" aria-hidden="true">
              Axis scale at the start
            </span>
            {(['linear', 'log'] as const).map((s) => (
              <label key={s} className="flex items-center gap-2">
                <input
                  type="radio"
                  name="scale"
                  value={s}
                  checked={own.scale === s}
                  onChange={() => setOwn((o) => ({ ...o, scale: s }))}
                  className="accent-humus-900"
                />
                {s === 'linear' ? 'Linear' : 'Log'}
              </label>
            ))}
          </fieldset>
        ) : null}
      </Panel>

      <Panel className="flex flex-col gap-4">
        <div>
          <h2 className="text-2xl font-semibold">Sliders</h2>
          <p className="text-loam-700">
            Fix each slider’s lowest and highest value, its step and where it starts. The class moves them
            only inside this range.
          </p>
        </div>
        {Object.entries(spec.sliders).map(([k, s]) => (
          <SliderEditor
            key={`${draft.template}-${k}`}
            sliderKey={k}
            spec={s}
            draft={own.sliders[k]}
            onChange={(d) => setOwn((o) => ({ ...o, sliders: { ...o.sliders, [k]: d } }))}
            errorAt={errorAt}
          />
        ))}
      </Panel>

      <Panel className="flex flex-col gap-4">
        <div>
          <h2 className="text-2xl font-semibold">Prompts and questions</h2>
          <p className="text-loam-700">
            Plain text or Markdown (**bold**, *italic*, lists, links). Scripts and other HTML are removed
            before anyone sees them.
          </p>
        </div>
        {draft.prompts.map((prompt, i) => (
          <div key={i} className="flex flex-col gap-2">
            <TextAreaField
              label={`Prompt ${i + 1}`}
              name={`prompt-${i}`}
              value={prompt}
              rows={3}
              maxLength={2000}
              onChange={(e) =>
                setDraft((d) => ({ ...d, prompts: d.prompts.map((p, j) => (j === i ? e.target.value : p)) }))
              }
              error={errorAt(`prompts[${i}]`)}
            />
            {draft.prompts.length > 1 ? (
              <Button
                variant="quiet"
                size="sm"
                className="self-start"
                onClick={() => setDraft((d) => ({ ...d, prompts: d.prompts.filter((_, j) => j !== i) }))}
              >
                Remove prompt {i + 1}
              </Button>
            ) : null}
          </div>
        ))}
        {draft.prompts.length < 12 ? (
          <Button
            variant="secondary"
            size="sm"
            className="self-start"
            onClick={() => setDraft((d) => ({ ...d, prompts: [...d.prompts, ''] }))}
          >
            Add a prompt
          </Button>
        ) : null}
        {errorAt('prompts') ? (
          <p className="text-sm font-medium text-danger-700">{errorAt('prompts')}</p>
        ) : null}
      </Panel>

      <FormAlert
        error={
          attempted && Object.keys(localErrors).length
            ? new Error('Some values need a look: each message is beside its field.')
            : saveError
        }
      />
      <div>
        <Button type="submit" pending={saving} pendingLabel="Saving…">
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}

type SliderEditorProps = {
  sliderKey: string;
  spec: SliderSpec;
  draft: SliderDraft;
  onChange: (draft: SliderDraft) => void;
  errorAt: (path: string) => string | undefined;
};

const parts = [
  ['min', 'Lowest'],
  ['max', 'Highest'],
  ['step', 'Step'],
  ['value', 'Starts at'],
] as const;

/** One slider's range, step and starting value, in the parameter's unit (converted to US customary where it has one). */
function SliderEditor({ sliderKey, spec, draft, onChange, errorAt }: SliderEditorProps) {
  const id = useId();
  const { system } = useUnits();
  const c = conversion(parameterCatalogue[spec.parameter].unit, system);
  const unit = c.unit;
  return (
    <fieldset className="flex flex-col gap-2 border-t border-silt-200 pt-4 first-of-type:border-t-0">
      <legend className="float-left w-full font-medium text-humus-900">{spec.label}</legend>
      <p className="text-sm text-loam-700">
        {spec.meaning} Allowed {c.toShown(spec.bounds.min)}–{c.toShown(spec.bounds.max)} ({unit}).
      </p>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {parts.map(([part, label]) => {
          const error = errorAt(`definition.settings.sliders.${sliderKey}.${part}`);
          const inputId = `${id}-${part}`;
          const d: NumberDraft = draft[part];
          return (
            <div key={part} className="flex flex-col gap-1">
              <label htmlFor={inputId} className="text-sm font-medium text-humus-900">
                {label}
                <span className="sr-only">, {spec.label}</span>
              </label>
              <div
                className={`flex items-stretch overflow-hidden rounded-seed border bg-white focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-clay-600 ${error ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400'}`}
              >
                <input
                  id={inputId}
                  type="text"
                  inputMode="decimal"
                  autoComplete="off"
                  value={shownText(spec.parameter, d, system)}
                  onChange={(e) => onChange({ ...draft, [part]: typedDraft(e.target.value, system) })}
                  aria-invalid={error !== undefined}
                  aria-describedby={error ? `${inputId}-error` : undefined}
                  className="min-h-10 w-full min-w-0 bg-transparent px-2 py-1.5 text-right tabular-nums focus-visible:outline-none"
                />
                <span className="flex items-center border-l border-silt-300 bg-silt-100 px-1.5 text-xs text-loam-700">
                  {unit}
                </span>
              </div>
              {error ? (
                <p id={`${inputId}-error`} className="text-sm font-medium text-danger-700">
                  {error}
                </p>
              ) : null}
            </div>
          );
        })}
      </div>
    </fieldset>
  );
}
