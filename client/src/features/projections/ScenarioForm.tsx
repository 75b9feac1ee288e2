import { useId, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import type { ScenarioBody, ScenarioView } from '../../../../shared/api/scenarios';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { InvalidSummary } from '../../shared/components/InvalidSummary';
import { ParameterField } from '../../shared/components/ParameterField';
import { SelectField } from '../../shared/components/SelectField';
import { TextField } from '../../shared/components/TextField';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useDraftForm } from '../../shared/lib/draftForm';
import type { NumberDraft } from '../../shared/lib/parameterDraft';
import { useLaunch, useSaveScenario, type ScenarioChoices } from './api';
import { DiscountRateField } from './DiscountRateField';
import { PesticideCautions } from './PesticideCautions';
import {
  buildScenario,
  MAX_STRATEGIES,
  scenarioDraft,
  scenarioServerErrors,
  type ScenarioDraft,
  type ScenarioNumberKey,
} from './scenarioDraft';

const efficacyDraws = [
  {
    value: 'per-replicate',
    label: 'Once per replicate',
    explanation:
      'Each replicate draws every step’s efficacy once and keeps it for all years: how well a step works here is uncertain, but steady.',
  },
  {
    value: 'per-application',
    label: 'At every application',
    explanation:
      'Each application draws its efficacy afresh: a step works better in some years than in others.',
  },
] as const;

type Intent = 'save' | 'run';

/**
 * The scenario editor: what to project (field, species profile, 1–6 strategies) and how
 * (horizon, replicates, seed, efficacy draw, depletion threshold, discount rate). "Save
 * and run" saves first, then launches and opens the comparison, where progress shows.
 */
export function ScenarioForm({ scenario, choices }: { scenario?: ScenarioView; choices: ScenarioChoices }) {
  const workspace = useCurrentWorkspace();
  const navigate = useNavigate();
  const save = useSaveScenario(workspace.id, scenario?.id);
  const launch = useLaunch(workspace.id);
  // A fresh seed for each new scenario, so two scenarios do not share chance by accident.
  const [initial] = useState(() =>
    scenarioDraft(scenario, {
      fieldId: choices.fields[0]?.id ?? '',
      profileId: choices.profiles[0]?.id ?? '',
      seed: Math.floor(Math.random() * 1_000_000_000),
    }),
  );
  const form = useDraftForm<ScenarioDraft, ScenarioBody>(initial, buildScenario, scenarioServerErrors);
  const { draft, edit, errorAt, formRef, savedAt } = form;
  const [intent, setIntent] = useState<Intent>('save');
  const strategiesId = useId();
  const drawId = useId();

  const text = (key: 'name' | 'fieldId' | 'profileId') => ({
    name: key,
    value: draft[key],
    error: errorAt(key),
    onChange: (event: { target: { value: string } }) => {
      const value = event.target.value;
      edit(key, (d) => ({ ...d, [key]: value }));
    },
  });
  const number = (key: ScenarioNumberKey) => (
    <ParameterField
      parameter={key}
      draft={draft.numbers[key]}
      onChange={(value: NumberDraft) => edit(key, (d) => ({ ...d, numbers: { ...d.numbers, [key]: value } }))}
      error={errorAt(key)}
    />
  );
  const toggleStrategy = (id: string, on: boolean) =>
    edit('strategyIds', (d) => ({
      ...d,
      strategyIds: on ? [...d.strategyIds, id] : d.strategyIds.filter((x) => x !== id),
    }));

  // Which button sent the form. Enter in a field submits with the first one, Save, never a run.
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (save.isPending || launch.isPending) return;
    const submitter = (event.nativeEvent as SubmitEvent).submitter;
    const next: Intent = submitter?.getAttribute('value') === 'run' ? 'run' : 'save';
    setIntent(next);
    void form.submit(async (body) => {
      const saved = await save.mutateAsync(body);
      if (next === 'run') {
        const launched = await launch.mutateAsync({ scenarioId: saved.id, body: {} }).catch(() => null);
        if (launched) navigate(`/w/${workspace.id}/batches/${launched.batchId}`);
      } else if (!scenario) {
        navigate(`/w/${workspace.id}/scenarios/${saved.id}`, { replace: true });
      }
    });
  };

  const picked = draft.strategyIds;
  const chemical = choices.strategies.filter((s) => picked.includes(s.id) && s.hasChemicalStep);
  const fieldName = (id: string | null) => choices.fields.find((f) => f.id === id)?.name;
  const strategyError = errorAt('strategyIds');

  return (
    <form ref={formRef} onSubmit={onSubmit} noValidate aria-label="Scenario" className="flex flex-col gap-8">
      <InvalidSummary
        show={form.showingAll && Object.keys(form.serverErrors).length === 0}
        count={Object.keys(form.built.errors).length}
        what="the scenario"
      />
      <FormAlert error={save.error ?? launch.error} />
      <div className="grid gap-5 md:grid-cols-2">
        <div className="md:col-span-2">
          <TextField
            label="Scenario name"
            required
            hint="For example the field and the planning period."
            {...text('name')}
          />
        </div>
        <SelectField
          label="Field"
          hint="Sets the starting seedbank, the area, the crop value and yield loss."
          options={[
            { value: '', label: 'Choose a field…' },
            ...choices.fields.map((f) => ({ value: f.id, label: `${f.name} (${f.crop})` })),
          ]}
          {...text('fieldId')}
        />
        <SelectField
          label="Species profile"
          hint="The weed's life history: germination, seed decay, fecundity, survival."
          options={[
            { value: '', label: 'Choose a species profile…' },
            ...choices.profiles.map((p) => ({
              value: p.id,
              label: p.builtIn ? `${p.name} — built in` : p.name,
            })),
          ]}
          {...text('profileId')}
        />
      </div>

      <fieldset
        aria-describedby={`${strategiesId}-hint${strategyError ? ` ${strategiesId}-error` : ''}`}
        className="flex flex-col gap-3"
      >
        <legend className="font-medium text-humus-900">Strategies to compare</legend>
        <p id={`${strategiesId}-hint`} className="-mt-1 text-sm text-loam-700">
          Pick 1 to {MAX_STRATEGIES}. Every launch also runs No control, the same field left alone, as the
          reference for the net present value.
        </p>
        {choices.strategies.length === 0 ? (
          <p className="text-sm text-humus-900">This workspace has no strategies yet; build one first.</p>
        ) : (
          <ul className="grid gap-2 md:grid-cols-2">
            {choices.strategies.map((s) => {
              const checked = picked.includes(s.id);
              const full = !checked && picked.length >= MAX_STRATEGIES;
              const forField = fieldName(s.fieldId);
              return (
                <li key={s.id}>
                  <label
                    className={`flex min-h-11 items-start gap-3 rounded-seed border px-3 py-2 has-checked:border-humus-900 has-checked:bg-silt-100 ${
                      strategyError ? 'border-danger-700' : 'border-silt-300'
                    } ${full ? 'cursor-not-allowed opacity-60' : 'cursor-pointer'}`}
                  >
                    <input
                      type="checkbox"
                      className="mt-1 size-4 accent-humus-900"
                      checked={checked}
                      disabled={full}
                      aria-invalid={strategyError ? true : undefined}
                      onChange={(e) => toggleStrategy(s.id, e.target.checked)}
                    />
                    <span className="flex flex-col">
                      <span className="font-medium text-humus-900">{s.name}</span>
                      <span className="text-xs text-loam-700">
                        {s.strategy.steps.length} step{s.strategy.steps.length === 1 ? '' : 's'}
                        {forField ? ` · for ${forField}` : ''}
                        {s.hasChemicalStep ? ' · has a chemical step' : ''}
                        {s.rateWarnings.length > 0 ? ' · a rate is above a recorded maximum' : ''}
                      </span>
                    </span>
                  </label>
                </li>
              );
            })}
          </ul>
        )}
        {strategyError ? (
          <p
            id={`${strategiesId}-error`}
            className="flex items-start gap-1.5 text-sm font-medium text-danger-700"
          >
            <span aria-hidden="true">✕</span>
            <span>{strategyError}</span>
          </p>
        ) : null}
        {picked.length >= MAX_STRATEGIES ? (
          <p className="text-sm text-loam-700">Six strategies are the most one comparison holds.</p>
        ) : null}
      </fieldset>
      {chemical.length > 0 ? <PesticideCautions strategies={chemical.map((s) => s.name)} /> : null}

      <section aria-labelledby={`${drawId}-settings`} className="flex flex-col">
        <h2 id={`${drawId}-settings`} className="mb-2 font-sans text-lg font-semibold">
          How the projection runs
        </h2>
        {number('horizonYears')}
        {number('replicates')}
        {number('seed')}
        {number('depletionThreshold')}
        <DiscountRateField
          value={draft.discountPercent}
          onChange={(value) => edit('discountRate', (d) => ({ ...d, discountPercent: value }))}
          error={errorAt('discountRate')}
        />
      </section>

      <fieldset aria-describedby={`${drawId}-hint`} className="flex flex-col gap-2">
        <legend className="font-medium text-humus-900">Efficacy draw</legend>
        <p id={`${drawId}-hint`} className="-mt-1 text-sm text-loam-700">
          How a step’s uncertain efficacy (its mean and spread from trials) is drawn.
        </p>
        <div className="grid gap-2 md:grid-cols-2">
          {efficacyDraws.map((option) => (
            <label
              key={option.value}
              className="flex cursor-pointer items-start gap-3 rounded-seed border border-silt-300 px-3 py-2 has-checked:border-humus-900 has-checked:bg-silt-100"
            >
              <input
                type="radio"
                name="efficacyDraw"
                value={option.value}
                className="mt-1 size-4 accent-humus-900"
                checked={draft.efficacyDraw === option.value}
                onChange={() => edit('efficacyDraw', (d) => ({ ...d, efficacyDraw: option.value }))}
              />
              <span className="flex flex-col">
                <span className="font-medium text-humus-900">{option.label}</span>
                <span className="text-sm text-loam-700">{option.explanation}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>

      <div className="flex flex-wrap items-center gap-3 border-t border-silt-300 pt-5">
        <Button
          type="submit"
          value="save"
          variant="secondary"
          pending={save.isPending && intent === 'save'}
          pendingLabel="Saving…"
        >
          {scenario ? 'Save changes' : 'Create scenario'}
        </Button>
        <Button
          type="submit"
          value="run"
          pending={(save.isPending && intent === 'run') || launch.isPending}
          pendingLabel="Launching…"
        >
          {scenario ? 'Save and run' : 'Create and run'}
        </Button>
        {savedAt && intent === 'save' ? (
          <p role="status" className="text-sm font-medium text-humus-900">
            Saved.
          </p>
        ) : null}
      </div>
    </form>
  );
}
