import { useEffect, useId, useRef, useState } from 'react';
import { allowedTimings } from '../../../../models/scenario/step-kinds';
import type { StepKind, Timing } from '../../../../models/scenario/types';
import { Button } from '../../shared/components/Button';
import { SelectField } from '../../shared/components/SelectField';
import { StepTile } from './StepGlyph';
import { kindGroups, kindInfo, timingInfo } from './stepKinds';

type AddStepPanelProps = {
  /** Where the person clicked on the timeline, if they did. */
  timing: Timing | null;
  year: number | null;
  onAdd: (kind: StepKind, timing: Timing, year: number | null) => void;
  onCancel: () => void;
};

/** Adding a step: choose its kind, then its season and years; the step's own form opens next. */
export function AddStepPanel({ timing, year, onAdd, onCancel }: AddStepPanelProps) {
  const id = useId();
  const [kind, setKind] = useState<StepKind | null>(null);
  const [season, setSeason] = useState<Timing | null>(timing);
  const [onlyThatYear, setOnlyThatYear] = useState(year !== null);
  const [missing, setMissing] = useState(false);
  const firstRef = useRef<HTMLInputElement>(null);

  useEffect(() => {
    firstRef.current?.focus();
  }, []);

  const allowed = kind ? allowedTimings(kind) : null;
  const chosenTiming = allowed ? (season && allowed.includes(season) ? season : allowed[0]) : null;

  const add = () => {
    if (!kind || !chosenTiming) {
      setMissing(true);
      firstRef.current?.focus();
      return;
    }
    onAdd(kind, chosenTiming, onlyThatYear ? year : null);
  };

  return (
    <section
      aria-labelledby={`${id}-title`}
      className="flex flex-col gap-5 rounded-seed border-2 border-humus-900 bg-white p-5 shadow-sheet sm:p-6"
      onKeyDown={(event) => {
        if (event.key === 'Escape') onCancel();
        // Enter on a choice adds the step, rather than submitting (saving) the whole strategy.
        if (event.key === 'Enter' && event.target instanceof HTMLInputElement) {
          event.preventDefault();
          add();
        }
      }}
    >
      <div>
        <h2 id={`${id}-title`} className="text-2xl font-semibold">
          Add a step
        </h2>
        <p className="text-loam-700">
          Choose what the step does. Its form then shows only the fields that kind of step has.
        </p>
      </div>
      <fieldset
        className="flex flex-col gap-4"
        aria-describedby={missing && !kind ? `${id}-missing` : undefined}
      >
        <legend className="sr-only">Kind of step</legend>
        {kindGroups.map((group, g) => (
          <div key={group.title} className="flex flex-col gap-2">
            <p className="text-sm font-semibold tracking-wide text-loam-700 uppercase" aria-hidden="true">
              {group.title}
            </p>
            <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
              {group.kinds.map((k, i) => (
                <label
                  key={k}
                  className={`flex cursor-pointer gap-3 rounded-seed border p-3 text-sm has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-clay-600 ${
                    kind === k
                      ? 'border-humus-900 bg-silt-100 ring-1 ring-humus-900'
                      : 'border-silt-300 hover:border-loam-600'
                  }`}
                >
                  <input
                    ref={g === 0 && i === 0 ? firstRef : undefined}
                    type="radio"
                    name={`${id}-kind`}
                    value={k}
                    checked={kind === k}
                    onChange={() => {
                      setKind(k);
                      setMissing(false);
                    }}
                    className="sr-only"
                  />
                  <StepTile kind={k} />
                  <span>
                    <span className="block font-medium text-humus-900">{kindInfo[k].name}</span>
                    <span className="text-loam-700">{kindInfo[k].summary}</span>
                  </span>
                </label>
              ))}
            </div>
          </div>
        ))}
        {missing && !kind ? (
          <p id={`${id}-missing`} role="alert" className="text-sm font-medium text-danger-700">
            Choose a kind of step first.
          </p>
        ) : null}
      </fieldset>
      {kind && allowed && chosenTiming ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="Season"
            name="timing"
            value={chosenTiming}
            hint={
              allowed.length < 5
                ? `${kindInfo[kind].name} can only be timed ${allowed.map((t) => timingInfo[t].name.toLowerCase()).join(' or ')}.`
                : undefined
            }
            options={allowed.map((t) => ({ value: t, label: timingInfo[t].name }))}
            onChange={(event) => setSeason(event.target.value as Timing)}
          />
          {year !== null ? (
            <fieldset className="flex flex-col gap-1.5">
              <legend className="font-medium text-humus-900">Years</legend>
              <label className="flex items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-years`}
                  checked={onlyThatYear}
                  onChange={() => setOnlyThatYear(true)}
                  className="accent-humus-900"
                />
                Year {year} only
              </label>
              <label className="flex items-center gap-2">
                <input
                  type="radio"
                  name={`${id}-years`}
                  checked={!onlyThatYear}
                  onChange={() => setOnlyThatYear(false)}
                  className="accent-humus-900"
                />
                Every year
              </label>
            </fieldset>
          ) : (
            <p className="self-end text-sm text-loam-700">
              It starts as every year; set other years in its form.
            </p>
          )}
        </div>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Button onClick={add}>Add step</Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
