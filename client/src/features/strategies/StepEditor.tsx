import { useId, type Ref } from 'react';
import {
  actionPoint,
  allowedTimings,
  targetStages,
  targetsAllowedAt,
} from '../../../../models/scenario/step-kinds';
import type { TargetStage, Timing } from '../../../../models/scenario/types';
import { Button } from '../../shared/components/Button';
import { ParameterField } from '../../shared/components/ParameterField';
import { PesticideCautions } from '../../shared/components/PesticideCautions';
import { SelectField } from '../../shared/components/SelectField';
import { TextField } from '../../shared/components/TextField';
import { conversion, formatNumber, shownText } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { describeSchedule } from './scheduleText';
import { StepTile } from './StepGlyph';
import { kindInfo, targetNames, timingInfo } from './stepKinds';
import {
  has,
  readSchedule,
  stepCatalogueKey,
  withTiming,
  type EfficacyForm,
  type ScheduleKind,
  type StepDraft,
  type StepNumberKey,
} from './strategyDraft';

type StepEditorProps = {
  step: StepDraft;
  number: number;
  editable: boolean;
  /** The message to show now for a path inside the step ("efficacy.mean"), if any. */
  errorAt: (path: string) => string | undefined;
  onEdit: (path: string, change: (step: StepDraft) => StepDraft) => void;
  warnings: readonly string[];
  onClose: () => void;
  onRepeat: () => void;
  onRemove: () => void;
  headingRef: Ref<HTMLHeadingElement>;
};

const scheduleKinds: { value: ScheduleKind; label: string }[] = [
  { value: 'every-year', label: 'Every year' },
  { value: 'every-k-years', label: 'Every k years from a first year' },
  { value: 'year-range', label: 'From one year to another' },
];

/** The form of one step: only the fields its kind has, each with meaning, unit, range and default. */
export function StepEditor({
  step,
  number,
  editable,
  errorAt,
  onEdit,
  warnings,
  onClose,
  onRepeat,
  onRemove,
  headingRef,
}: StepEditorProps) {
  const id = useId();
  const info = kindInfo[step.kind];
  const chemical = has(step, 'chemical');

  const numberField = (
    key: StepNumberKey,
    options: { meaning?: string; optional?: boolean; unit?: string } = {},
  ) => (
    <ParameterField
      key={key}
      parameter={stepCatalogueKey(key)}
      draft={step.numbers[key]}
      onChange={(value) => onEdit(key, (s) => ({ ...s, numbers: { ...s.numbers, [key]: value } }))}
      error={errorAt(key)}
      meaning={options.meaning}
      optional={options.optional}
      unit={options.unit}
      readOnly={!editable}
    />
  );

  return (
    <section
      id="step-editor"
      aria-labelledby={`${id}-title`}
      className="flex flex-col gap-5 rounded-seed border-2 border-humus-900 bg-white p-5 shadow-sheet sm:p-6"
    >
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div className="flex items-start gap-3">
          <StepTile kind={step.kind} className="size-10" />
          <div>
            <h2
              id={`${id}-title`}
              ref={headingRef}
              tabIndex={-1}
              className="text-2xl font-semibold focus:outline-none"
            >
              Step {number}: {step.label || info.name}
            </h2>
            <p className="text-loam-700">
              <span className="font-medium text-humus-900">{info.name}</span> · {info.summary}
            </p>
          </div>
        </div>
        <Button variant="secondary" size="sm" onClick={onClose}>
          {editable ? 'Done' : 'Close'}
        </Button>
      </header>

      {warnings.length > 0 ? (
        <div
          role="alert"
          className="rounded-seed border-l-4 border-clay-600 bg-clay-100 px-4 py-3 text-sm text-humus-900"
        >
          <p className="font-semibold">Above a maximum rate you recorded (as last saved)</p>
          <ul className="mt-1 list-disc pl-5">
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {errorAt('') ? <FieldMessage message={errorAt('')!} /> : null}

      {editable ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField
            label="Step name"
            name="label"
            required
            value={step.label}
            error={errorAt('label')}
            onChange={(event) => {
              const label = event.target.value;
              onEdit('label', (s) => ({ ...s, label }));
            }}
          />
          <SelectField
            label="Season"
            name="timing"
            value={step.timing}
            error={errorAt('timing')}
            hint={
              allowedTimings(step.kind).length < 5
                ? `${info.name} can only be timed ${allowedTimings(step.kind)
                    .map((t) => timingInfo[t].name.toLowerCase())
                    .join(' or ')}.`
                : undefined
            }
            options={allowedTimings(step.kind).map((t) => ({ value: t, label: timingInfo[t].name }))}
            onChange={(event) => {
              const timing = event.target.value as Timing;
              onEdit('timing', (s) => withTiming(s, timing).step);
            }}
          />
        </div>
      ) : (
        <dl className="grid gap-3 sm:grid-cols-3">
          <Fact label="Season" value={timingInfo[step.timing].name} />
          <Fact label="When" value={describeSchedule(readSchedule(step))} />
          {has(step, 'targets') ? (
            <Fact label="Targets" value={step.targets.map((t) => targetNames[t]).join(', ')} />
          ) : null}
        </dl>
      )}

      {editable ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-lg font-semibold">When it applies</legend>
          <div className="flex flex-wrap gap-x-5 gap-y-2">
            {scheduleKinds.map((option) => (
              <label key={option.value} className="flex items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-schedule`}
                  value={option.value}
                  checked={step.scheduleKind === option.value}
                  onChange={() => onEdit('schedule', (s) => ({ ...s, scheduleKind: option.value }))}
                  className="accent-humus-900"
                />
                {option.label}
              </label>
            ))}
          </div>
          <div className="flex flex-col">
            {step.scheduleKind === 'every-k-years'
              ? [numberField('schedule.k'), numberField('schedule.start')]
              : null}
            {step.scheduleKind === 'year-range'
              ? [numberField('schedule.first'), numberField('schedule.last')]
              : null}
          </div>
        </fieldset>
      ) : null}

      {editable && has(step, 'targets') ? (
        <TargetsField step={step} error={errorAt('targets') ?? firstTargetError(errorAt)} onEdit={onEdit} />
      ) : null}

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-lg font-semibold">Efficacy</legend>
        <p className="text-sm text-loam-700">{info.efficacy} Give it as trials report it.</p>
        {editable ? (
          <div className="flex flex-wrap gap-x-5 gap-y-2">
            {(
              [
                ['mean-sd', 'Mean ± standard deviation'],
                ['range', 'Lowest, most likely, highest'],
              ] as [EfficacyForm, string][]
            ).map(([form, label]) => (
              <label key={form} className="flex items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-efficacy`}
                  value={form}
                  checked={step.efficacyForm === form}
                  onChange={() => onEdit('efficacy', (s) => ({ ...s, efficacyForm: form }))}
                  className="accent-humus-900"
                />
                {label}
              </label>
            ))}
          </div>
        ) : null}
        {errorAt('efficacy') ? <FieldMessage message={errorAt('efficacy')!} /> : null}
        <div className="flex flex-col">
          {step.efficacyForm === 'mean-sd'
            ? [
                numberField('efficacy.mean', {
                  meaning: `Mean of the ${info.efficacy.charAt(0).toLowerCase()}${info.efficacy.slice(1)}`,
                }),
                numberField('efficacy.sd'),
              ]
            : [numberField('efficacy.min'), numberField('efficacy.mode'), numberField('efficacy.max')]}
        </div>
      </fieldset>

      {info.fields.some((f) => f !== 'targets' && f !== 'chemical') ? (
        <fieldset className="flex flex-col">
          <legend className="mb-1 text-lg font-semibold">What it does</legend>
          {has(step, 'topKill') ? numberField('topKill') : null}
          {has(step, 'seedsPerPlantReduction') ? numberField('seedsPerPlantReduction') : null}
          {has(step, 'seedReturnReduction') ? numberField('seedReturnReduction') : null}
          {has(step, 'burial') ? numberField('burial') : null}
          {has(step, 'exhumation') ? numberField('exhumation') : null}
          {has(step, 'fragmentsPerPlant') ? numberField('fragmentsPerPlant') : null}
        </fieldset>
      ) : null}

      <fieldset className="flex flex-col">
        <legend className="mb-1 text-lg font-semibold">Cost of one application</legend>
        {numberField('cost.material')}
        {numberField('cost.application')}
        <CostTotal step={step} />
      </fieldset>

      {chemical ? (
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 text-lg font-semibold">Product, as on the label</legend>
          <p className="text-sm text-loam-700">
            Seedwake records what you enter from the label and never suggests or fills in a rate.
          </p>
          {editable ? (
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label="Active ingredient"
                name="chemical.activeIngredient"
                value={step.activeIngredient}
                error={errorAt('chemical.activeIngredient') ?? errorAt('chemical')}
                hint="The common name on the label."
                onChange={(event) => {
                  const activeIngredient = event.target.value;
                  onEdit('chemical.activeIngredient', (s) => ({ ...s, activeIngredient }));
                }}
              />
              <TextField
                label="Rate unit"
                name="chemical.rateUnit"
                value={step.rateUnit}
                error={errorAt('chemical.rateUnit')}
                hint="As on the label, e.g. kg a.i./ha."
                onChange={(event) => {
                  const rateUnit = event.target.value;
                  onEdit('chemical.rateUnit', (s) => ({ ...s, rateUnit }));
                }}
              />
            </div>
          ) : (
            <dl className="grid gap-3 sm:grid-cols-2">
              <Fact label="Active ingredient" value={step.activeIngredient || 'not recorded'} />
              <Fact
                label="Rate"
                value={
                  step.numbers['chemical.rate'].text
                    ? `${step.numbers['chemical.rate'].text} ${step.rateUnit}`
                    : 'not recorded'
                }
              />
            </dl>
          )}
          {editable
            ? numberField('chemical.rate', {
                optional: true,
                unit: step.rateUnit.trim() || 'unit as entered',
              })
            : null}
          <PesticideCautions />
        </fieldset>
      ) : null}

      {editable ? (
        <div className="flex flex-wrap gap-3 border-t border-silt-300 pt-4">
          <Button variant="secondary" size="sm" onClick={onRepeat}>
            Repeat this step
          </Button>
          <Button variant="danger" size="sm" onClick={onRemove}>
            Remove this step
          </Button>
        </div>
      ) : null}
    </section>
  );
}

function firstTargetError(errorAt: (path: string) => string | undefined): string | undefined {
  for (let i = 0; i < targetStages.length; i++) {
    const message = errorAt(`targets[${i}]`);
    if (message) return message;
  }
  return undefined;
}

function TargetsField({
  step,
  error,
  onEdit,
}: {
  step: StepDraft;
  error?: string;
  onEdit: StepEditorProps['onEdit'];
}) {
  const reachable = targetsAllowedAt(actionPoint(step.kind, step.timing));
  const id = useId();
  const toggle = (stage: TargetStage) =>
    onEdit('targets', (s) => ({
      ...s,
      targets: s.targets.includes(stage)
        ? s.targets.filter((t) => t !== stage)
        : targetStages.filter((t) => t === stage || s.targets.includes(t)),
    }));
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? `${id}-error` : undefined}>
      <legend className="mb-1 text-lg font-semibold">Targets</legend>
      <div className="flex flex-wrap gap-x-5 gap-y-2">
        {targetStages.map((stage) => (
          <label
            key={stage}
            className={`flex items-center gap-2 ${reachable.includes(stage) ? '' : 'text-loam-600'}`}
          >
            <input
              type="checkbox"
              checked={step.targets.includes(stage)}
              disabled={!reachable.includes(stage)}
              onChange={() => toggle(stage)}
              aria-invalid={error !== undefined}
              className="size-4 accent-humus-900"
            />
            {targetNames[stage]}
          </label>
        ))}
      </div>
      {!reachable.includes('flowering') ? (
        <p className="text-sm text-loam-700">
          Plants flower after spring, so a step this early reaches seedlings and rosettes only.
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`}>
          <FieldMessage message={error} />
        </p>
      ) : null}
    </fieldset>
  );
}

function CostTotal({ step }: { step: StepDraft }) {
  const { system } = useUnits();
  const c = conversion('currency/ha', system);
  const material = Number(shownText('strategy.steps[].cost.material', step.numbers['cost.material'], system));
  const application = Number(
    shownText('strategy.steps[].cost.application', step.numbers['cost.application'], system),
  );
  if (!Number.isFinite(material + application)) return null;
  return (
    <p className="pt-2 text-sm text-loam-700">
      Together {formatNumber(material + application, 2)} {c.unit} each time the step applies.
    </p>
  );
}

function FieldMessage({ message }: { message: string }) {
  return (
    <span className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
      <span aria-hidden="true">✕</span>
      <span>{message}</span>
    </span>
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-sm text-loam-700">{label}</dt>
      <dd className="font-medium">{value}</dd>
    </div>
  );
}
