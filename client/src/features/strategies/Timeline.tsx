import {
  useEffect,
  useRef,
  useState,
  type DOMAttributes,
  type KeyboardEvent,
  type PointerEvent,
} from 'react';
import { allowedTimings, timings } from '../../../../models/scenario/step-kinds';
import { isScheduled } from '../../../../models/lifecycle/schedule';
import type { Timing } from '../../../../models/scenario/types';
import { StepTile } from './StepGlyph';
import { kindInfo, timingInfo } from './stepKinds';
import { readSchedule, type StepDraft } from './strategyDraft';
import { describeSchedule } from './scheduleText';

export type KeyMove = 'earlier-season' | 'later-season' | 'earlier-year' | 'later-year';

type TimelineProps = {
  steps: readonly StepDraft[];
  years: number;
  editable: boolean;
  selectedKey: string | null;
  /** Problems to flag on a step's chip. */
  flags: Record<string, { error?: boolean; warning?: boolean }>;
  onSelect: (key: string, moveFocus: boolean) => void;
  onKeyMove: (key: string, move: KeyMove) => void;
  onDrop: (key: string, timing: Timing, yearShift: number) => void;
  onRemove: (key: string) => void;
  onRepeat: (key: string) => void;
  onAddAt: (timing: Timing, year: number) => void;
  /** A chip to focus after it was re-rendered elsewhere by a move. */
  focusKey: string | null;
  onFocused: () => void;
};

type PointerHandlers = Pick<
  DOMAttributes<HTMLElement>,
  'onPointerDown' | 'onPointerMove' | 'onPointerUp' | 'onPointerCancel'
>;

type Drag = {
  key: string;
  pointerId: number;
  fromYear: number | null;
  startX: number;
  startY: number;
  moved: boolean;
  overTiming: Timing | null;
  overYear: number | null;
};

/*
 * Season bands drawn as soil strata, from the pale dormant season at the top to the
 * dark loam of fall at the bottom, as a year goes down through a soil profile. Each step
 * is a lane in its season's band, with its glyph tile in every year it applies.
 */
const bandSurface: Record<Timing, string> = {
  'dormant-early-spring': 'bg-silt-100',
  spring: 'bg-silt-200',
  summer: 'bg-clay-100',
  'late-summer': 'bg-silt-300',
  fall: 'bg-loam-300',
};
const bandEdge: Record<Timing, string> = {
  'dormant-early-spring': 'fill-silt-100',
  spring: 'fill-silt-200',
  summer: 'fill-clay-100',
  'late-summer': 'fill-silt-300',
  fall: 'fill-loam-300',
};

const columns = (years: number) => ({ gridTemplateColumns: `18rem repeat(${years}, minmax(2.5rem, 1fr))` });

function targetAt(x: number, y: number): { timing: Timing | null; year: number | null } {
  let timing: Timing | null = null;
  let year: number | null = null;
  for (const element of document.elementsFromPoint(x, y)) {
    const band = element.closest<HTMLElement>('[data-timing]');
    const cell = element.closest<HTMLElement>('[data-year]');
    if (band && timing === null) timing = band.dataset.timing as Timing;
    if (cell && year === null) year = Number(cell.dataset.year);
  }
  return { timing, year };
}

export function Timeline(props: TimelineProps) {
  const { steps, years, editable, selectedKey, flags, focusKey, onFocused } = props;
  const rootRef = useRef<HTMLDivElement>(null);
  const [drag, setDrag] = useState<Drag | null>(null);
  // A pointer press that turned into a drag must not also count as a click.
  const suppressClick = useRef(false);

  useEffect(() => {
    if (focusKey === null) return;
    rootRef.current?.querySelector<HTMLElement>(`[data-step-chip="${focusKey}"]`)?.focus();
    onFocused();
  }, [focusKey, onFocused, steps]);

  const yearList = Array.from({ length: years }, (_, i) => i + 1);

  const pointerHandlers = (key: string, year: number | null): PointerHandlers =>
    editable
      ? {
          onPointerDown: (event: PointerEvent<HTMLElement>) => {
            if (event.button !== 0) return;
            // A drag whose release fired no click must not swallow this press's click.
            suppressClick.current = false;
            event.currentTarget.setPointerCapture(event.pointerId);
            setDrag({
              key,
              pointerId: event.pointerId,
              fromYear: year,
              startX: event.clientX,
              startY: event.clientY,
              moved: false,
              overTiming: null,
              overYear: null,
            });
          },
          onPointerMove: (event: PointerEvent<HTMLElement>) => {
            if (!drag || drag.pointerId !== event.pointerId) return;
            const far = Math.hypot(event.clientX - drag.startX, event.clientY - drag.startY) > 5;
            if (!drag.moved && !far) return;
            const over = targetAt(event.clientX, event.clientY);
            setDrag({ ...drag, moved: true, overTiming: over.timing, overYear: over.year });
          },
          onPointerUp: (event: PointerEvent<HTMLElement>) => {
            if (!drag || drag.pointerId !== event.pointerId) return;
            setDrag(null);
            if (!drag.moved) return;
            suppressClick.current = true;
            const step = steps.find((s) => s.key === drag.key);
            if (!step) return;
            const shift =
              drag.fromYear !== null && drag.overYear !== null ? drag.overYear - drag.fromYear : 0;
            props.onDrop(drag.key, drag.overTiming ?? step.timing, shift);
          },
          onPointerCancel: () => setDrag(null),
        }
      : {};

  const onChipKey = (key: string) => (event: KeyboardEvent<HTMLButtonElement>) => {
    const moves: Record<string, KeyMove> = {
      ArrowUp: 'earlier-season',
      ArrowDown: 'later-season',
      ArrowLeft: 'earlier-year',
      ArrowRight: 'later-year',
    };
    if (event.key === 'Enter') {
      event.preventDefault();
      props.onSelect(key, true);
      return;
    }
    if (!editable) return;
    if (event.key in moves) {
      event.preventDefault();
      props.onKeyMove(key, moves[event.key]);
    } else if (event.key === 'Delete' || event.key === 'Backspace') {
      event.preventDefault();
      props.onRemove(key);
    } else if (event.key === 'd' || event.key === 'D') {
      event.preventDefault();
      props.onRepeat(key);
    }
  };

  const dropTiming = drag?.moved ? drag.overTiming : null;
  const dragged = drag?.moved ? steps.find((s) => s.key === drag.key) : undefined;

  return (
    <div ref={rootRef} className={`overflow-x-auto ${drag?.moved ? 'cursor-grabbing select-none' : ''}`}>
      <div className="min-w-max">
        <div className="grid border-b border-loam-400 text-sm" style={columns(years)}>
          <div className="px-3 py-2 font-semibold text-loam-700">Season · step</div>
          {yearList.map((y) => (
            <div
              key={y}
              data-year={y}
              className={`py-2 text-center font-semibold ${
                drag?.moved && drag.overYear === y ? 'bg-clay-100 text-humus-900' : 'text-loam-700'
              }`}
            >
              <span className="sr-only">Year </span>
              {y}
            </div>
          ))}
        </div>
        {timings.map((timing, bandIndex) => {
          const lanes = steps.filter((s) => s.timing === timing);
          const allowed = dragged ? allowedTimings(dragged.kind).includes(timing) : true;
          const isDrop = dropTiming === timing;
          return (
            <section
              key={timing}
              data-timing={timing}
              aria-labelledby={`band-${timing}`}
              className={`relative ${bandSurface[timing]} ${
                isDrop
                  ? allowed
                    ? 'outline-3 -outline-offset-3 outline-humus-900'
                    : 'outline-3 -outline-offset-3 outline-danger-700'
                  : ''
              }`}
            >
              {bandIndex > 0 ? <StratumEdge timing={timing} seed={bandIndex} /> : null}
              <div className="grid items-center" style={columns(years)}>
                <div className="px-3 pt-2.5 pb-1" style={{ gridColumn: `1 / span ${years + 1}` }}>
                  <h3
                    id={`band-${timing}`}
                    className="font-sans text-sm font-semibold tracking-wide text-humus-900 uppercase"
                  >
                    {timingInfo[timing].name}
                  </h3>
                  <p className="text-xs text-humus-800">
                    {timingInfo[timing].detail}
                    {isDrop && !allowed && dragged ? (
                      <span className="ml-2 font-semibold text-danger-700">
                        {kindInfo[dragged.kind].name} cannot be timed here.
                      </span>
                    ) : null}
                  </p>
                </div>
                {lanes.length === 0 && !editable ? (
                  <p
                    className="px-3 pb-3 text-sm text-humus-800"
                    style={{ gridColumn: `1 / span ${years + 1}` }}
                  >
                    No steps.
                  </p>
                ) : null}
                {lanes.map((step) => (
                  <Lane
                    key={step.key}
                    step={step}
                    years={yearList}
                    selected={selectedKey === step.key}
                    dragging={drag?.moved === true && drag.key === step.key}
                    editable={editable}
                    flags={flags[step.key] ?? {}}
                    onChipClick={() => {
                      if (suppressClick.current) {
                        suppressClick.current = false;
                        return;
                      }
                      props.onSelect(step.key, false);
                    }}
                    onChipKey={onChipKey(step.key)}
                    pointerHandlers={pointerHandlers}
                  />
                ))}
                {editable ? (
                  <>
                    <div className="px-3 py-1 text-xs text-humus-800" aria-hidden="true">
                      {lanes.length === 0
                        ? 'No steps. Click a year to add one.'
                        : 'Click a year to add a step.'}
                    </div>
                    {yearList.map((y) => (
                      // Mouse shortcut only; the "Add a step" button does the same from the keyboard.
                      <div
                        key={y}
                        data-year={y}
                        aria-hidden="true"
                        onClick={() => props.onAddAt(timing, y)}
                        className="group flex h-8 cursor-copy items-center justify-center"
                        title={`Add a step in ${timingInfo[timing].name.toLowerCase()}, year ${y}`}
                      >
                        <span className="text-lg leading-none text-humus-800 opacity-0 group-hover:opacity-100">
                          +
                        </span>
                      </div>
                    ))}
                  </>
                ) : (
                  <div className="h-2" style={{ gridColumn: `1 / span ${years + 1}` }} />
                )}
              </div>
            </section>
          );
        })}
      </div>
    </div>
  );
}

type LaneProps = {
  step: StepDraft;
  years: number[];
  selected: boolean;
  dragging: boolean;
  editable: boolean;
  flags: { error?: boolean; warning?: boolean };
  onChipClick: () => void;
  onChipKey: (event: KeyboardEvent<HTMLButtonElement>) => void;
  pointerHandlers: (key: string, year: number | null) => PointerHandlers;
};

function Lane({
  step,
  years,
  selected,
  dragging,
  editable,
  flags,
  onChipClick,
  onChipKey,
  pointerHandlers,
}: LaneProps) {
  const schedule = readSchedule(step);
  const on = (y: number) => schedule !== null && isScheduled(schedule, y);
  const when = describeSchedule(schedule);
  return (
    <>
      <div className="px-2 py-1">
        <button
          type="button"
          data-step-chip={step.key}
          onClick={onChipClick}
          onKeyDown={onChipKey}
          aria-expanded={selected}
          aria-controls={selected ? 'step-editor' : undefined}
          aria-describedby={editable ? 'timeline-help' : undefined}
          aria-keyshortcuts={editable ? 'ArrowUp ArrowDown ArrowLeft ArrowRight Enter Delete D' : undefined}
          {...pointerHandlers(step.key, null)}
          className={`flex w-full touch-none items-center gap-2 rounded-seed border px-2 py-1.5 text-left text-sm transition-shadow ${
            selected
              ? 'border-humus-900 bg-white shadow-sheet ring-2 ring-humus-900'
              : 'border-transparent bg-white/80 hover:border-loam-500 hover:bg-white'
          } ${editable ? 'cursor-grab' : ''} ${dragging ? 'opacity-60' : ''}`}
        >
          <StepTile kind={step.kind} />
          <span className="min-w-0 flex-1">
            <span className="line-clamp-2 block font-medium leading-snug text-humus-900">
              {step.label || kindInfo[step.kind].name}
            </span>
            <span className="block truncate text-xs text-loam-700">{when}</span>
          </span>
          {flags.warning ? (
            <span
              className="shrink-0 rounded-sm bg-clay-300 px-1 text-xs font-semibold text-humus-900"
              title="Rate above a recorded maximum"
            >
              rate!
            </span>
          ) : null}
          {flags.error ? (
            <span className="shrink-0 rounded-sm bg-danger-700 px-1 text-xs font-semibold text-silt-50">
              fix
            </span>
          ) : null}
          <span className="sr-only">
            , {kindInfo[step.kind].name}, {timingInfo[step.timing].name}
            {flags.warning ? ', rate warning' : ''}
            {flags.error ? ', needs a fix' : ''}
          </span>
        </button>
      </div>
      {years.map((y) => {
        const active = on(y);
        return (
          <div
            key={y}
            data-year={y}
            className="relative flex h-11 items-center justify-center"
            aria-hidden="true"
          >
            {active && on(y - 1) ? (
              <span className="absolute top-1/2 left-0 h-0.5 w-1/2 -translate-y-1/2 bg-humus-800/50" />
            ) : null}
            {active && on(y + 1) ? (
              <span className="absolute top-1/2 right-0 h-0.5 w-1/2 -translate-y-1/2 bg-humus-800/50" />
            ) : null}
            {active ? (
              <span
                {...pointerHandlers(step.key, y)}
                onClick={onChipClick}
                className={`relative touch-none ${editable ? 'cursor-grab' : ''} ${selected ? 'drop-shadow-[0_0_0.15rem_rgb(36_26_19_/_0.6)]' : ''}`}
              >
                <StepTile kind={step.kind} />
              </span>
            ) : (
              <span className="size-1 rounded-full bg-humus-800/25" />
            )}
          </div>
        );
      })}
    </>
  );
}

/** A wavy boundary between two season bands, like the boundary between two soil horizons. */
function StratumEdge({ timing, seed }: { timing: Timing; seed: number }) {
  const points = Array.from({ length: 9 }, (_, i) => {
    const wobble = Math.sin(i * 1.7 + seed * 2.3) * 2.2 + Math.cos(i * 0.9 + seed) * 1.2;
    return `${(i * 100) / 8},${4 + wobble}`;
  });
  return (
    <svg
      className="pointer-events-none absolute -top-[7px] left-0 h-2 w-full"
      viewBox="0 0 100 8"
      preserveAspectRatio="none"
      aria-hidden="true"
    >
      <polygon points={`0,8 ${points.join(' ')} 100,8`} className={bandEdge[timing]} />
    </svg>
  );
}
