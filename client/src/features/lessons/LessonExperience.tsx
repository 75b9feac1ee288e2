import { useEffect, useRef, useState, type ReactNode } from 'react';
import type { ReplayResponse } from '../../../../shared/api/lessons';
import { startingValues, type SliderValues } from '../../../../shared/lessons/runs';
import { sliderSpec, type Slider } from '../../../../shared/lessons/templates';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { SpeciesCard } from '../../shared/components/SpeciesCard';
import { useReplay } from './api';
import type { LessonContent } from './lessonContent';
import { LessonSlider } from './LessonSlider';
import { Prompts } from './Prompts';
import { TemplateView } from './TemplateView';
import { useLessonRuns } from './useLessonRuns';
import { Handout } from './Handout';

type LessonExperienceProps = {
  content: LessonContent;
  replayTarget: Parameters<typeof useReplay>[0];
  photoUrl: (photoId: string) => string;
  /** The page's own heading and actions, shown above the lesson in page mode. */
  header: ReactNode;
};

type Replayed = { key: string; response: ReplayResponse };

/**
 * A lesson as a class uses it. Slider moves stay in this browser (nothing is sent until
 * "Replay with chance"); the charts are the engine's mean field computed here. The same
 * state drives the page, the projector view and the printable handout, so switching
 * between them keeps the settings.
 */
export function LessonExperience({ content, replayTarget, photoUrl, header }: LessonExperienceProps) {
  const { definition, profile } = content;
  const [values, setValues] = useState<SliderValues>(() => startingValues(definition));
  const [view, setView] = useState<'page' | 'handout'>('page');
  const [projector, setProjector] = useState(false);
  const [replayed, setReplayed] = useState<Replayed | null>(null);
  const [nextSeed, setNextSeed] = useState(definition.settings.seed);
  const replay = useReplay(replayTarget);
  const runs = useLessonRuns(definition, profile?.profile ?? null, values);
  const key = JSON.stringify(values);
  const current = replayed?.key === key ? replayed.response : null;

  const press = () => {
    const seed = nextSeed;
    replay.mutate(
      { values, seed },
      {
        onSuccess: (response) => {
          setReplayed({ key, response });
          setNextSeed((s) => (s + 1) % 4_294_967_296);
        },
      },
    );
  };

  const body = (large: boolean) => (
    <LessonBody
      content={content}
      values={values}
      onChange={(k, v) => setValues((old) => ({ ...old, [k]: v }))}
      runs={runs}
      replay={current}
      stale={replayed !== null && current === null}
      replayControl={
        <ReplayButton
          pending={replay.isPending}
          error={replay.error}
          onPress={press}
          last={current}
          large={large}
        />
      }
      photoUrl={photoUrl}
      large={large}
    />
  );

  if (view === 'handout') {
    return (
      <Handout
        content={content}
        values={values}
        runs={runs}
        replay={current}
        photoUrl={photoUrl}
        onBack={() => setView('page')}
      />
    );
  }

  return (
    <div className="flex flex-col gap-6" data-values={key}>
      <div className="flex flex-wrap items-end justify-between gap-4">
        {header}
        <div className="flex flex-wrap gap-2 print:hidden">
          <Button variant="secondary" onClick={() => setProjector(true)}>
            Projector mode
          </Button>
          <Button variant="secondary" onClick={() => setView('handout')}>
            Handout
          </Button>
        </div>
      </div>
      {body(false)}
      {projector ? (
        <ProjectorDialog title={content.title} onClose={() => setProjector(false)}>
          {body(true)}
        </ProjectorDialog>
      ) : null}
    </div>
  );
}

type LessonBodyProps = {
  content: LessonContent;
  values: SliderValues;
  onChange: (key: string, value: number) => void;
  runs: ReturnType<typeof useLessonRuns>;
  replay: ReplayResponse | null;
  stale: boolean;
  replayControl: ReactNode;
  photoUrl: (photoId: string) => string;
  large: boolean;
};

function LessonBody({
  content,
  values,
  onChange,
  runs,
  replay,
  stale,
  replayControl,
  photoUrl,
  large,
}: LessonBodyProps) {
  const { definition } = content;
  const sliders = definition.settings.sliders as Record<string, Slider>;
  const controls = (
    <section
      aria-label="Sliders"
      className={`grid content-start gap-x-8 gap-y-5 rounded-seed border border-silt-300 bg-white p-5 print:hidden ${large ? '' : 'md:grid-cols-2'}`}
    >
      {Object.entries(sliders).map(([k, slider]) => (
        <LessonSlider
          key={k}
          spec={sliderSpec(definition.template, k)!}
          slider={slider}
          value={values[k]}
          onChange={(v) => onChange(k, v)}
          large={large}
        />
      ))}
      <div className={`flex flex-col gap-2 ${large ? '' : 'md:col-span-2'}`}>
        {replayControl}
        {stale ? (
          <p role="status" className={`text-loam-700 ${large ? 'text-xl' : 'text-sm'}`}>
            The sliders moved since the last replay: press again to see chance at these settings.
          </p>
        ) : null}
      </div>
    </section>
  );
  const view = (
    <TemplateView definition={definition} runs={runs} values={values} replay={replay} large={large} />
  );
  return (
    <div className={`flex flex-col ${large ? 'gap-10' : 'gap-6'}`}>
      {large ? (
        // On a projector the sliders sit beside the charts, so a move and its effect are seen together.
        <div className="grid items-start gap-8 xl:grid-cols-[minmax(22rem,2fr)_minmax(0,5fr)]">
          {controls}
          {view}
        </div>
      ) : (
        <>
          {controls}
          {view}
        </>
      )}
      <Prompts prompts={content.prompts} large={large} />
      {content.card && content.profile ? (
        <SpeciesCard name={content.profile.name} card={content.card} photoUrl={photoUrl} large={large} />
      ) : null}
    </div>
  );
}

function ReplayButton({
  pending,
  error,
  onPress,
  last,
  large,
}: {
  pending: boolean;
  error: unknown;
  onPress: () => void;
  last: ReplayResponse | null;
  large: boolean;
}) {
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-4">
        <Button
          onClick={onPress}
          pending={pending}
          pendingLabel="Replaying…"
          className={large ? 'text-2xl' : ''}
        >
          Replay with chance
        </Button>
        <p className={`text-loam-700 ${large ? 'text-xl' : 'text-sm'}`} role="status">
          {last
            ? `${last.replicates} replicates with seed ${last.seed}: the shaded bands hold the middle half and 90 % of them.`
            : 'Lines are the expected values. A replay runs the same settings many times with chance, on the server.'}
        </p>
      </div>
      <FormAlert error={error} />
    </div>
  );
}

/**
 * Projector mode: the lesson alone in a full-screen modal dialog — large type, black on
 * white, no header or navigation. The browser makes the page behind it inert, Escape
 * closes it, and Tab moves between the sliders, whose arrow keys change the value.
 */
function ProjectorDialog({
  title,
  onClose,
  children,
}: {
  title: string;
  onClose: () => void;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  // Unmounting removes the dialog from the page, which also takes it out of the top layer;
  // closing it here instead would fire its close event and close it again on a re-run.
  useEffect(() => {
    if (ref.current && !ref.current.open) ref.current.showModal();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-label={`Projector mode: ${title}`}
      onClose={onClose}
      data-mode="projector"
      className="m-0 h-dvh max-h-none w-dvw max-w-none overflow-y-auto bg-white p-6 text-black backdrop:bg-black sm:p-10"
    >
      <div className="mx-auto flex max-w-[110rem] flex-col gap-8 text-xl">
        <div className="flex flex-wrap items-start justify-between gap-4">
          <h1 className="text-5xl font-semibold text-black">{title}</h1>
          <Button variant="secondary" onClick={onClose} className="text-xl">
            Leave projector mode (Esc)
          </Button>
        </div>
        <p className="text-lg text-loam-700">
          Tab to a slider, then use ← → (Page Up / Page Down for bigger steps, Home / End for the ends).
        </p>
        {children}
      </div>
    </dialog>
  );
}
