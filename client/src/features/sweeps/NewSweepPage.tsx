import { useId, useMemo, useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { SweepBody } from '../../../../shared/api/sweeps';
import { outcomeInfo, outcomeKinds, outcomeLabel } from '../../../../shared/sweeps/outcomes';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { SelectField } from '../../shared/components/SelectField';
import { TextField } from '../../shared/components/TextField';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useUnits } from '../../shared/lib/units';
import { useLaunchSweep, useSweepChoices, useSweepParameters, useSweepPreview } from './api';
import { Cautions } from './Cautions';
import { designNames, duration, grouped, unitShown } from './display';
import { ParameterRows } from './ParameterRows';
import { bodyOf, emptyDraft, type SweepDraft } from './sweepDraft';
import { useDebounced } from './useDebounced';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

const designHelp: Record<SweepBody['design']['kind'], string> = {
  'one-at-a-time':
    'The scenario as it is, then each parameter alone at its min and at its max: 2k + 1 points, read as a tornado chart.',
  factorial: 'Every combination of evenly spaced levels: levels^k points, read as main effects.',
  'latin-hypercube':
    'Points spread so each parameter’s range is cut into equal strata with one point in each; read as partial rank correlations (PRCC) with p-values.',
  sobol:
    'Saltelli sampling, N·(k + 2) points: first-order and total Sobol’ indices with bootstrap intervals (the share of the outcome’s variance each parameter explains).',
};

/** /w/:workspaceId/sweeps/new — define a sweep, see its size and time, launch it. */
export function NewSweepPage() {
  const workspace = useCurrentWorkspace();
  const { system } = useUnits();
  const navigate = useNavigate();
  const choices = useSweepChoices(workspace.id);
  const [draft, setDraft] = useState<SweepDraft>(emptyDraft);
  const parameters = useSweepParameters(workspace.id, draft.scenarioId, draft.strategyId);
  const launch = useLaunchSweep(workspace.id);
  // An edit makes a refused launch's messages stale; the preview re-checks what is typed now.
  const set = (patch: Partial<SweepDraft>) => {
    setDraft((d) => ({ ...d, ...patch }));
    if (launch.isError) launch.reset();
  };
  const outcomesId = useId();

  const catalogue = useMemo(
    () => new Map((parameters.data?.parameters ?? []).map((p) => [p.path, p])),
    [parameters.data],
  );
  const { body, errors: localErrors } = bodyOf(draft, catalogue);
  const debounced = useDebounced(body, 400);
  const preview = useSweepPreview(
    workspace.id,
    debounced && debounced.parameters.length > 0 ? debounced : null,
  );
  const previewCurrent = JSON.stringify(debounced) === JSON.stringify(body);
  const serverErrors =
    launch.error instanceof ApiRequestError
      ? launch.error.fields
      : preview.error instanceof ApiRequestError && previewCurrent
        ? preview.error.fields
        : {};
  // Until a scenario is picked, every field is still at its start: nothing to point out yet.
  const errors = { ...serverErrors, ...(draft.scenarioId === '' ? {} : localErrors) };

  if (workspace.role === 'viewer') {
    return (
      <Panel>
        <p>Sweeps are started by editors. Ask an owner for the editor role if you need to run one.</p>
      </Panel>
    );
  }
  if (choices.isPending) return <LoadingNotice>Loading the scenarios…</LoadingNotice>;
  if (choices.isError)
    return (
      <ErrorNotice
        title="The scenarios could not be loaded"
        error={choices.error}
        onRetry={() => void choices.refetch()}
      />
    );

  const scenarios = choices.data.scenarios;
  const scenario = scenarios.find((s) => s.id === draft.scenarioId);
  const strategies = (scenario?.strategyIds ?? [])
    .map((id) => choices.data.strategies.find((s) => s.id === id))
    .filter((s) => s !== undefined);

  const pickScenario = (id: string) => {
    const sc = scenarios.find((s) => s.id === id);
    const first = sc?.strategyIds[0] ?? '';
    const strategyName = choices.data.strategies.find((s) => s.id === first)?.name;
    set({
      scenarioId: id,
      strategyId: first,
      parameters: [],
      outcomeYear: sc ? String(sc.horizonYears) : '',
      seed: sc ? String(sc.seed) : draft.seed,
      name: draft.name === '' && strategyName ? `${strategyName}: sensitivity` : draft.name,
    });
  };

  const ready =
    body !== null && body.parameters.length > 0 && preview.isSuccess && previewCurrent && !preview.isFetching;
  const submit = () => {
    if (!body || !ready) return;
    launch.mutate(body, { onSuccess: (view) => navigate(`../${view.id}`, { relative: 'path' }) });
  };

  return (
    <div className="flex flex-col gap-8">
      <title>{`New sweep · ${workspace.name} · Seedwake`}</title>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to=".." relative="path" className={linkClass}>
          ← All sweeps
        </Link>
      </nav>
      <PageTitle
        eyebrow="Sensitivity"
        title="New sweep"
        lead="Pick one strategy of a scenario, the parameters you are unsure of and their ranges; the sweep runs that projection at every point of the design."
      />
      {scenarios.length === 0 ? (
        <Panel>
          <p>This workspace has no scenario yet. A sweep starts from a scenario and one of its strategies.</p>
        </Panel>
      ) : (
        <form
          className="flex flex-col gap-6"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            submit();
          }}
        >
          <Section title="What to vary">
            <div className="grid gap-4 md:grid-cols-2">
              <SelectField
                label="Scenario"
                name="scenarioId"
                value={draft.scenarioId}
                onChange={(e) => pickScenario(e.target.value)}
                options={[
                  { value: '', label: 'Choose a scenario…' },
                  ...scenarios.map((s) => ({ value: s.id, label: s.name })),
                ]}
              />
              <SelectField
                label="Strategy"
                name="strategyId"
                value={draft.strategyId}
                onChange={(e) => set({ strategyId: e.target.value, parameters: [] })}
                options={strategies.map((s) => ({ value: s.id, label: s.name }))}
                hint="The sweep varies this strategy’s projection."
                error={errors.strategyId}
              />
            </div>
            <TextField
              label="Name"
              name="name"
              value={draft.name}
              onChange={(e) => set({ name: e.target.value })}
              required
              error={errors.name}
            />
            {parameters.data?.hasChemicalStep ? <Cautions /> : null}
            {draft.strategyId === '' ? null : parameters.isPending ? (
              <LoadingNotice>Loading the parameters…</LoadingNotice>
            ) : parameters.isError ? (
              <ErrorNotice title="The parameters could not be loaded" error={parameters.error} />
            ) : (
              <ParameterRows
                available={parameters.data.parameters}
                rows={draft.parameters}
                onChange={(rows) => set({ parameters: rows })}
                errors={errors}
              />
            )}
          </Section>

          <Section title="Design">
            <fieldset className="flex flex-col gap-3">
              <legend className="sr-only">Design</legend>
              {(Object.keys(designNames) as SweepBody['design']['kind'][]).map((kind) => (
                <Choice
                  key={kind}
                  type="radio"
                  name="design"
                  label={designNames[kind]}
                  description={designHelp[kind]}
                  checked={draft.design === kind}
                  onChange={() => set({ design: kind })}
                />
              ))}
            </fieldset>
            <div className="max-w-xs">
              {draft.design === 'factorial' ? (
                <TextField
                  label="Levels per parameter"
                  name="levels"
                  value={draft.levels}
                  onChange={(e) => set({ levels: e.target.value })}
                  inputMode="numeric"
                  required
                  error={errors['design.levels'] ?? errors.design}
                />
              ) : draft.design === 'latin-hypercube' ? (
                <TextField
                  label="Points"
                  name="points"
                  value={draft.points}
                  onChange={(e) => set({ points: e.target.value })}
                  inputMode="numeric"
                  required
                  error={errors['design.points'] ?? errors.design}
                />
              ) : draft.design === 'sobol' ? (
                <TextField
                  label="Base samples (N)"
                  name="baseSamples"
                  value={draft.baseSamples}
                  onChange={(e) => set({ baseSamples: e.target.value })}
                  inputMode="numeric"
                  required
                  hint="Powers of two suit the Sobol’ sequence best."
                  error={errors['design.baseSamples'] ?? errors.design}
                />
              ) : errors.design ? (
                <p className="text-sm font-medium text-danger-700">{errors.design}</p>
              ) : null}
            </div>
          </Section>

          <Section title="What to record">
            <fieldset className="flex flex-col gap-2">
              <legend id={outcomesId} className="font-medium text-humus-900">
                Outcomes
              </legend>
              {outcomeKinds.map((kind) => (
                <Choice
                  key={kind}
                  type="checkbox"
                  name="outcomes"
                  label={`${outcomeLabel(kind, Number(draft.outcomeYear) || 0).replace('year 0', 'year T')} (${unitShown(outcomeInfo[kind].unit, system)})`}
                  description={outcomeInfo[kind].meaning}
                  checked={draft.outcomes.includes(kind)}
                  onChange={(checked) =>
                    set({
                      outcomes: checked
                        ? outcomeKinds.filter((k) => k === kind || draft.outcomes.includes(k))
                        : draft.outcomes.filter((k) => k !== kind),
                    })
                  }
                />
              ))}
              {errors.outcomes ? (
                <p className="text-sm font-medium text-danger-700">{errors.outcomes}</p>
              ) : null}
            </fieldset>
            <div className="grid gap-4 md:grid-cols-3">
              <TextField
                label="Year T"
                name="outcomeYear"
                value={draft.outcomeYear}
                onChange={(e) => set({ outcomeYear: e.target.value })}
                inputMode="numeric"
                unit="year"
                hint={scenario ? `1–${scenario.horizonYears}, within the horizon` : undefined}
                required
                error={errors.outcomeYear}
              />
              <TextField
                label="Replicates per point"
                name="replicatesPerPoint"
                value={draft.replicatesPerPoint}
                onChange={(e) => set({ replicatesPerPoint: e.target.value })}
                inputMode="numeric"
                unit="runs"
                hint="1–100,000"
                required
                error={errors.replicatesPerPoint}
              />
              <TextField
                label="Seed"
                name="seed"
                value={draft.seed}
                onChange={(e) => set({ seed: e.target.value })}
                inputMode="numeric"
                hint="The same definition and seed always give the same points."
                required
                error={errors.seed}
              />
            </div>
          </Section>

          <Panel className="flex flex-col gap-4">
            <h2 className="text-xl font-semibold">Size before launch</h2>
            <div role="status" aria-live="polite" className="flex flex-col gap-2">
              {body === null || body.parameters.length === 0 ? (
                <p className="text-loam-700">Choose a strategy and at least one parameter to see the size.</p>
              ) : errors.size ? (
                <p className="rounded-seed border-l-4 border-danger-700 bg-danger-50 px-4 py-3 font-medium text-danger-700">
                  Too large to run: {errors.size}
                </p>
              ) : preview.data && previewCurrent && !preview.isError ? (
                <p>
                  <span className="font-display text-2xl font-semibold">
                    {grouped(preview.data.points)} points
                  </span>{' '}
                  × {grouped(preview.data.replicatesPerPoint)} replicates × {preview.data.horizonYears} years
                  ={' '}
                  <span className="font-semibold">
                    {grouped(preview.data.replicateYears)} replicate-years
                  </span>
                  <span className="block text-sm text-loam-700">
                    About {duration(preview.data.estimatedSeconds)} on this server’s worker alone (more with
                    extra workers); the workspace limit is {grouped(preview.data.limit)} replicate-years.
                  </span>
                </p>
              ) : preview.isError && previewCurrent ? (
                <p className="text-danger-700">Fix the fields marked above to see the size.</p>
              ) : (
                <p className="text-loam-700">Working out the size…</p>
              )}
            </div>
            <FormAlert error={launch.error} />
            <div>
              <Button
                type="submit"
                pending={launch.isPending}
                pendingLabel="Launching…"
                aria-disabled={!ready || undefined}
              >
                Launch sweep
              </Button>
            </div>
          </Panel>
        </form>
      )}
    </div>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id}>
      <Panel className="flex flex-col gap-4">
        <h2 id={id} className="text-xl font-semibold">
          {title}
        </h2>
        {children}
      </Panel>
    </section>
  );
}

/** A radio button or checkbox named by its short label, with its longer description read after it. */
function Choice({
  type,
  name,
  label,
  description,
  checked,
  onChange,
}: {
  type: 'radio' | 'checkbox';
  name: string;
  label: string;
  description: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
}) {
  const id = useId();
  return (
    <div className="flex items-start gap-3">
      <input
        id={id}
        type={type}
        name={name}
        checked={checked}
        onChange={(e) => onChange(e.target.checked)}
        aria-describedby={`${id}-description`}
        className="mt-1 size-4 accent-humus-900"
      />
      <div>
        <label htmlFor={id} className="font-medium text-humus-900">
          {label}
        </label>
        <p id={`${id}-description`} className="text-sm text-loam-700">
          {description}
        </p>
      </div>
    </div>
  );
}
