import { useCallback, useEffect, useRef, useState, type ReactNode } from 'react';
import type { StrategyBody, StrategyView } from '../../../../shared/api/strategies';
import { allowedTimings, chemicalKinds, timings } from '../../../../models/scenario/step-kinds';
import type { Schedule, StepKind, Timing } from '../../../../models/scenario/types';
import { buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { InvalidSummary } from '../../shared/components/InvalidSummary';
import { PesticideCautions } from '../../shared/components/PesticideCautions';
import { SaveBar } from '../../shared/components/SaveBar';
import { SelectField } from '../../shared/components/SelectField';
import { TextAreaField } from '../../shared/components/TextAreaField';
import { TextField } from '../../shared/components/TextField';
import { useDraftForm } from '../../shared/lib/draftForm';
import { AddStepPanel } from './AddStepPanel';
import { MaxRatesTable } from './MaxRatesTable';
import { describeSchedule } from './scheduleText';
import { StepEditor } from './StepEditor';
import { kindInfo, targetNames, timingInfo } from './stepKinds';
import {
  buildStrategy,
  draftFromView,
  draftPaths,
  newStepDraft,
  readSchedule,
  repeatStep,
  stepErrors,
  withSchedule,
  withTiming,
  type StepDraft,
  type StrategyDraft,
} from './strategyDraft';
import { Timeline, type KeyMove } from './Timeline';

/** A field the strategy can belong to; its crop picks which recorded maximum rates apply. */
export type FieldOption = { id: string; name: string; crop: string };

type StrategyBuilderProps = {
  view: StrategyView | null;
  fields: readonly FieldOption[];
  editable: boolean;
  onSave: (body: StrategyBody) => Promise<StrategyView>;
  saving: boolean;
  saveError: unknown;
  actions?: ReactNode;
};

type RateWarning = { key: string; message: string };

const LAST_YEAR = 200;
const yearsShownOptions = [5, 10, 15, 20, 30, 40];

function latestYear(steps: readonly StepDraft[]): number {
  let latest = 0;
  for (const step of steps) {
    const s = readSchedule(step);
    if (s?.kind === 'year-range') latest = Math.max(latest, s.last);
    if (s?.kind === 'every-k-years') latest = Math.max(latest, s.start);
  }
  return latest;
}

const name = (step: StepDraft) => `“${step.label || kindInfo[step.kind].name}”`;

function shifted(schedule: Schedule, by: number): Schedule | string {
  if (schedule.kind === 'every-year') return 'applies every year; open it with Enter to choose its years';
  if (schedule.kind === 'every-k-years') {
    const start = schedule.start + by;
    if (start < 1) return 'already starts in year 1';
    if (start > LAST_YEAR) return `cannot start after year ${LAST_YEAR}`;
    return { ...schedule, start };
  }
  const first = schedule.first + by;
  const last = schedule.last + by;
  if (first < 1) return 'already starts in year 1';
  if (last > LAST_YEAR) return `cannot run past year ${LAST_YEAR}`;
  return { kind: 'year-range', first, last };
}

/**
 * The strategy builder: a year-by-season timeline of the steps, where steps are added,
 * moved (dragged with the mouse, or with the arrow keys), repeated and removed; the
 * form of the chosen step; the recorded maximum rates; and saving.
 */
export function StrategyBuilder({
  view,
  fields,
  editable,
  onSave,
  saving,
  saveError,
  actions,
}: StrategyBuilderProps) {
  const [start] = useState(() => {
    const draft = draftFromView(view);
    const warnings: RateWarning[] = (view?.rateWarnings ?? []).flatMap((w) =>
      draft.steps[w.stepIndex] ? [{ key: draft.steps[w.stepIndex].key, message: w.message }] : [],
    );
    return { draft, warnings };
  });
  const form = useDraftForm(start.draft, buildStrategy, draftPaths);
  const { draft, built, edit, errorAt, formRef, savedAt } = form;
  const [warnings, setWarnings] = useState(start.warnings);
  const [selectedKey, setSelectedKey] = useState<string | null>(null);
  const [adding, setAdding] = useState<{ timing: Timing | null; year: number | null } | null>(null);
  const [yearsShown, setYearsShown] = useState(() => {
    const latest = latestYear(start.draft.steps);
    return yearsShownOptions.find((y) => y >= Math.max(10, latest)) ?? 40;
  });
  const [announcement, setAnnouncement] = useState('');
  const [undo, setUndo] = useState<{ step: StepDraft; index: number } | null>(null);
  const [focusKey, setFocusKey] = useState<string | null>(null);
  const [focusEditor, setFocusEditor] = useState(0);
  const editorHeading = useRef<HTMLHeadingElement>(null);
  const addButton = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (focusEditor > 0) editorHeading.current?.focus();
  }, [focusEditor]);
  const clearFocusKey = useCallback(() => setFocusKey(null), []);

  const setSteps = (path: string, change: (steps: StepDraft[]) => StepDraft[]) =>
    edit(path, (d) => ({ ...d, steps: change(d.steps) }));
  const editStep = (key: string) => (path: string, change: (step: StepDraft) => StepDraft) =>
    setSteps(`steps.${key}${path === '' ? '' : `.${path}`}`, (steps) =>
      steps.map((s) => (s.key === key ? change(s) : s)),
    );

  const stepByKey = (key: string) => draft.steps.find((s) => s.key === key);

  const moveSeason = (step: StepDraft, timing: Timing): string => {
    const { step: moved, dropped } = withTiming(step, timing);
    editStep(step.key)('timing', () => moved);
    const note = dropped.length
      ? ` ${dropped.map((t) => targetNames[t].toLowerCase()).join(' and ')} dropped from its targets: plants flower after spring.`
      : '';
    return `Moved ${name(step)} to ${timingInfo[timing].name.toLowerCase()}.${note}`;
  };

  const moveYears = (step: StepDraft, by: number): string => {
    const schedule = readSchedule(step);
    if (schedule === null) return `${name(step)}: fix its schedule first.`;
    const next = shifted(schedule, by);
    if (typeof next === 'string') return `${name(step)} ${next}.`;
    editStep(step.key)('schedule', (s) => withSchedule(s, next));
    return `Moved ${name(step)} to ${describeSchedule(next)}.`;
  };

  const onKeyMove = (key: string, move: KeyMove) => {
    const step = stepByKey(key);
    if (!step) return;
    if (move === 'earlier-year' || move === 'later-year') {
      setAnnouncement(moveYears(step, move === 'later-year' ? 1 : -1));
    } else {
      const order = timings.filter((t) => allowedTimings(step.kind).includes(t));
      const next = order[order.indexOf(step.timing) + (move === 'later-season' ? 1 : -1)];
      setAnnouncement(
        next
          ? moveSeason(step, next)
          : `${name(step)} stays in ${timingInfo[step.timing].name.toLowerCase()}: ${kindInfo[step.kind].name.toLowerCase()} can be timed ${order
              .map((t) => timingInfo[t].name.toLowerCase())
              .join(' or ')}.`,
      );
    }
    setFocusKey(key);
  };

  const onDrop = (key: string, timing: Timing, yearShift: number) => {
    const step = stepByKey(key);
    if (!step) return;
    const said: string[] = [];
    let current = step;
    if (timing !== step.timing) {
      if (allowedTimings(step.kind).includes(timing)) {
        said.push(moveSeason(step, timing));
        current = withTiming(step, timing).step;
      } else {
        said.push(`${kindInfo[step.kind].name} cannot be timed in ${timingInfo[timing].name.toLowerCase()}.`);
      }
    }
    if (yearShift !== 0) said.push(moveYears(current, yearShift));
    if (said.length > 0) setAnnouncement(said.join(' '));
    setSelectedKey(key);
  };

  const removeStep = (key: string) => {
    const index = draft.steps.findIndex((s) => s.key === key);
    if (index < 0) return;
    const step = draft.steps[index];
    setSteps('steps', (steps) => steps.filter((s) => s.key !== key));
    setUndo({ step, index });
    if (selectedKey === key) setSelectedKey(null);
    setAnnouncement(`Removed ${name(step)}.`);
    const next = draft.steps[index + 1] ?? draft.steps[index - 1];
    if (next) setFocusKey(next.key);
    else addButton.current?.focus();
  };

  const repeat = (key: string) => {
    const index = draft.steps.findIndex((s) => s.key === key);
    if (index < 0) return;
    const copy = repeatStep(draft.steps[index]);
    setSteps('steps', (steps) => [...steps.slice(0, index + 1), copy, ...steps.slice(index + 1)]);
    setAnnouncement(
      `Repeated ${name(copy)}: the copy sits under it; move it with the arrow keys or by dragging.`,
    );
    setFocusKey(copy.key);
  };

  const addStep = (kind: StepKind, timing: Timing, year: number | null) => {
    const step = newStepDraft(kind, timing, year);
    setSteps('steps', (steps) => [...steps, step]);
    setAdding(null);
    setSelectedKey(step.key);
    setFocusEditor((n) => n + 1);
    setAnnouncement(
      `Added ${name(step)} in ${timingInfo[step.timing].name.toLowerCase()}, ${describeSchedule(readSchedule(step))}.`,
    );
  };

  const select = (key: string, moveFocus: boolean) => {
    setAdding(null);
    setSelectedKey(key);
    if (moveFocus) setFocusEditor((n) => n + 1);
  };

  const firstStepWithError = (errors: Record<string, string>) =>
    draft.steps.find((s) => Object.keys(stepErrors(errors, s.key)).length > 0)?.key ?? null;

  const save = () => {
    if (saving) return;
    if (!built.body) {
      // Open the first step with a problem so focus can land on the field that has it.
      const key = firstStepWithError(built.errors);
      if (key && !Object.keys(stepErrors(built.errors, selectedKey ?? '')).length) setSelectedKey(key);
    }
    const keys = draft.steps.map((s) => s.key);
    void form.submit((body) =>
      onSave(body).then(
        (saved) => {
          setWarnings(
            saved.rateWarnings.flatMap((w) =>
              keys[w.stepIndex] ? [{ key: keys[w.stepIndex], message: w.message }] : [],
            ),
          );
          return saved;
        },
        (error: unknown) => {
          const fields = (error as { fields?: Record<string, string> }).fields;
          const key = fields ? firstStepWithError(draftPaths(fields, draft)) : null;
          if (key) setSelectedKey(key);
          throw error;
        },
      ),
    );
  };

  const flags: Record<string, { error?: boolean; warning?: boolean }> = {};
  for (const step of draft.steps) {
    const paths = Object.keys({ ...built.errors, ...form.serverErrors }).filter(
      (p) => p === `steps.${step.key}` || p.startsWith(`steps.${step.key}.`),
    );
    flags[step.key] = {
      error: paths.some((p) => errorAt(p) !== undefined),
      warning: warnings.some((w) => w.key === step.key),
    };
  }

  const selected = selectedKey ? stepByKey(selectedKey) : undefined;
  const selectedNumber = selected ? draft.steps.indexOf(selected) + 1 : 0;
  const chemical = draft.steps.some((s) => chemicalKinds.includes(s.kind));
  const field = fields.find((f) => f.id === draft.fieldId);

  // A new strategy is named first; an existing one opens on its timeline.
  const details = editable ? (
    <section
      aria-labelledby="strategy-details-title"
      className="rounded-seed border border-silt-300 bg-white p-5 shadow-sheet sm:p-6"
    >
      <h2 id="strategy-details-title" className="mb-4 text-xl font-semibold">
        About this strategy
      </h2>
      <div className="grid gap-4 md:grid-cols-2">
        <TextField
          label="Strategy name"
          name="strategy.name"
          required
          value={draft.name}
          error={errorAt('strategy.name')}
          onChange={(event) => {
            const value = event.target.value;
            edit('strategy.name', (d: StrategyDraft) => ({ ...d, name: value }));
          }}
        />
        <SelectField
          label="Field"
          name="fieldId"
          value={draft.fieldId ?? ''}
          error={errorAt('fieldId')}
          hint="The field’s crop decides which recorded maximum rates apply."
          options={[
            { value: '', label: 'No particular field' },
            ...fields.map((f) => ({ value: f.id, label: `${f.name} (${f.crop})` })),
          ]}
          onChange={(event) => {
            const value = event.target.value;
            edit('fieldId', (d: StrategyDraft) => ({ ...d, fieldId: value === '' ? null : value }));
          }}
        />
        <div className="md:col-span-2">
          <TextAreaField
            label="Description"
            name="description"
            value={draft.description}
            maxLength={2000}
            error={errorAt('description')}
            onChange={(event) => {
              const value = event.target.value;
              edit('description', (d: StrategyDraft) => ({ ...d, description: value }));
            }}
          />
        </div>
      </div>
    </section>
  ) : null;

  return (
    <form
      ref={formRef}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        save();
      }}
      aria-label={`Strategy ${draft.name || '(unnamed)'}`}
      className="flex flex-col gap-6"
    >
      <InvalidSummary
        show={form.showingAll && Object.keys(form.serverErrors).length === 0}
        count={Object.keys(built.errors).length}
        what="the strategy"
      />
      <FormAlert error={saveError} />

      {warnings.length > 0 ? (
        <section
          aria-labelledby="rate-warnings-title"
          className="rounded-seed border-2 border-clay-600 bg-clay-100 px-5 py-4 text-humus-900"
        >
          <h2 id="rate-warnings-title" className="font-sans text-lg font-semibold">
            {warnings.length === 1 ? 'A step’s rate is' : `${warnings.length} rates are`} above a maximum you
            recorded
          </h2>
          <ul className="mt-2 flex flex-col gap-1">
            {warnings.map((w) => {
              const step = stepByKey(w.key);
              return (
                <li key={`${w.key}-${w.message}`} className="flex flex-wrap items-baseline gap-x-3">
                  <span>{w.message}</span>
                  {step ? (
                    <button
                      type="button"
                      onClick={() => select(w.key, true)}
                      className="text-sm font-medium text-russet-700 underline underline-offset-4"
                    >
                      Open {name(step)}
                    </button>
                  ) : null}
                </li>
              );
            })}
          </ul>
          <p className="mt-2 text-sm">As last saved. Check the label: it is the legal guide.</p>
        </section>
      ) : null}

      {chemical ? <PesticideCautions /> : null}

      {view === null ? details : null}

      <section
        aria-labelledby="timeline-title"
        className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-4 shadow-sheet sm:p-5"
      >
        <div className="flex flex-wrap items-end justify-between gap-4">
          <div>
            <h2 id="timeline-title" className="text-2xl font-semibold">
              Year by season
            </h2>
            <p id="timeline-help" className="max-w-prose text-sm text-loam-700">
              {editable ? (
                <>
                  Each step is a row in its season, with a tile in every year it applies. Drag a step’s tile
                  or name to another season or year. From the keyboard, focus a step and press{' '}
                  <kbd className="font-mono">↑</kbd> <kbd className="font-mono">↓</kbd> to change its season,{' '}
                  <kbd className="font-mono">←</kbd> <kbd className="font-mono">→</kbd> to move it by a year,{' '}
                  <kbd className="font-mono">Enter</kbd> to edit it, <kbd className="font-mono">D</kbd> to
                  repeat it and <kbd className="font-mono">Delete</kbd> to remove it.
                </>
              ) : (
                'Each step is a row in its season, with a tile in every year it applies. Choose a step to read its details.'
              )}
            </p>
          </div>
          <div className="flex flex-wrap items-end gap-3">
            <div className="w-36">
              <SelectField
                label="Years shown"
                name="yearsShown"
                size="sm"
                value={String(yearsShown)}
                options={yearsShownOptions.map((y) => ({ value: String(y), label: `1–${y}` }))}
                onChange={(event) => setYearsShown(Number(event.target.value))}
              />
            </div>
            {editable ? (
              <button
                type="button"
                ref={addButton}
                className={buttonClasses('primary')}
                onClick={() => {
                  setSelectedKey(null);
                  setAdding({ timing: null, year: null });
                }}
              >
                Add a step
              </button>
            ) : null}
          </div>
        </div>
        <p role="status" aria-live="polite" className="min-h-5 text-sm font-medium text-humus-900">
          {announcement}
          {undo && announcement.startsWith('Removed') ? (
            <button
              type="button"
              className="ml-2 text-russet-700 underline underline-offset-4"
              onClick={() => {
                const { step, index } = undo;
                setSteps('steps', (steps) => [...steps.slice(0, index), step, ...steps.slice(index)]);
                setUndo(null);
                setAnnouncement(`Put back ${name(step)}.`);
                setFocusKey(step.key);
              }}
            >
              Undo
            </button>
          ) : null}
        </p>
        {draft.steps.length === 0 ? (
          <p className="rounded-seed bg-silt-100 px-3 py-2 text-sm text-loam-700">
            {editable
              ? 'No steps yet: a strategy without steps is the same as doing nothing. Add a step, or click a year in a season.'
              : 'No steps: this strategy does nothing.'}
          </p>
        ) : null}
        <Timeline
          steps={draft.steps}
          years={yearsShown}
          editable={editable}
          selectedKey={selectedKey}
          flags={flags}
          onSelect={select}
          onKeyMove={onKeyMove}
          onDrop={onDrop}
          onRemove={removeStep}
          onRepeat={repeat}
          onAddAt={(timing, year) => {
            setSelectedKey(null);
            setAdding({ timing, year });
          }}
          focusKey={focusKey}
          onFocused={clearFocusKey}
        />
      </section>

      {adding ? (
        <AddStepPanel
          key={`${adding.timing}-${adding.year}`}
          timing={adding.timing}
          year={adding.year}
          onAdd={addStep}
          onCancel={() => {
            setAdding(null);
            addButton.current?.focus();
          }}
        />
      ) : null}

      {selected ? (
        <StepEditor
          key={selected.key}
          step={selected}
          number={selectedNumber}
          editable={editable}
          errorAt={(path) => errorAt(`steps.${selected.key}${path === '' ? '' : `.${path}`}`)}
          onEdit={editStep(selected.key)}
          warnings={warnings.filter((w) => w.key === selected.key).map((w) => w.message)}
          onClose={() => {
            setSelectedKey(null);
            setFocusKey(selected.key);
          }}
          onRepeat={() => repeat(selected.key)}
          onRemove={() => removeStep(selected.key)}
          headingRef={editorHeading}
        />
      ) : null}

      {view !== null ? details : null}
      <section
        aria-labelledby="max-rates-title"
        className="rounded-seed border border-silt-300 bg-white p-5 shadow-sheet sm:p-6"
      >
        <h2 id="max-rates-title" className="text-xl font-semibold">
          Maximum rates from the labels
        </h2>
        <p className="mb-3 max-w-prose text-sm text-loam-700">
          Record the maximum rate per crop from each product label you use. Seedwake warns when a step’s
          entered rate is higher{field ? ` for ${field.crop}, the crop of ${field.name}` : ''}; it holds no
          rates of its own.
        </p>
        <MaxRatesTable
          rates={draft.maxRates}
          editable={editable}
          errorAt={errorAt}
          crop={field?.crop ?? null}
          onChange={(path, change) =>
            edit(path, (d: StrategyDraft) => ({ ...d, maxRates: change(d.maxRates) }))
          }
        />
      </section>

      <SaveBar
        editable={editable}
        actions={actions}
        saving={saving}
        savedAt={savedAt}
        label="Save strategy"
      />
    </form>
  );
}
