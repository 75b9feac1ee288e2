import type { ReplayResponse } from '../../../../shared/api/lessons';
import type { SliderValues } from '../../../../shared/lessons/runs';
import { sliderSpec } from '../../../../shared/lessons/templates';
import { parameterCatalogue } from '../../../../shared/scenario/parameters';
import { Button } from '../../shared/components/Button';
import { SpeciesCard } from '../../shared/components/SpeciesCard';
import { conversion, formatNumber } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import type { LessonContent } from './lessonContent';
import { Prompts } from './Prompts';
import { TemplateView } from './TemplateView';
import type { ComputedRun } from './useLessonRuns';

type HandoutProps = {
  content: LessonContent;
  values: SliderValues;
  runs: readonly ComputedRun[];
  replay: ReplayResponse | null;
  photoUrl: (photoId: string) => string;
  onBack: () => void;
};

/**
 * The printable handout: the lesson's charts and figures at the settings on screen, the
 * settings themselves, its questions with room to answer, and the species card. Buttons
 * and the site header are left off the printout by the print stylesheet.
 */
export function Handout({ content, values, runs, replay, photoUrl, onBack }: HandoutProps) {
  const { system } = useUnits();
  const sliders = Object.keys(content.definition.settings.sliders).map((k) => {
    const spec = sliderSpec(content.definition.template, k)!;
    const c = conversion(parameterCatalogue[spec.parameter].unit, system);
    return { k, label: spec.label, text: `${formatNumber(c.toShown(values[k]), 3)} ${c.unit}` };
  });
  return (
    <article className="mx-auto flex w-full max-w-[42rem] flex-col gap-6 bg-white" data-mode="handout">
      {/* Page margins for the printout; the CSP allows inline styles. The article is as wide as a
          printed page, so the charts, drawn at their measured width, fit the paper. */}
      <style>{'@page { margin: 14mm; }'}</style>
      <div className="flex flex-wrap gap-2 print:hidden">
        <Button onClick={() => window.print()}>Print the handout</Button>
        <Button variant="secondary" onClick={onBack}>
          Back to the lesson
        </Button>
      </div>
      <header className="flex flex-col gap-1 border-b-4 border-double border-loam-400 pb-3">
        <p className="text-sm font-semibold tracking-wide text-russet-700 uppercase">
          Seedwake lesson · handout
        </p>
        <h1 className="text-4xl font-semibold">{content.title}</h1>
        {content.profile ? <p className="text-loam-700">Species profile: {content.profile.name}</p> : null}
      </header>
      <section aria-labelledby="settings-title" className="break-inside-avoid">
        <h2 id="settings-title" className="text-xl font-semibold">
          At these settings
        </h2>
        <dl className="mt-2 grid gap-x-6 gap-y-1 sm:grid-cols-2">
          {sliders.map((s) => (
            <div key={s.k} className="flex justify-between gap-4 border-b border-silt-200 py-1">
              <dt>{s.label}</dt>
              <dd className="font-semibold tabular-nums">{s.text}</dd>
            </div>
          ))}
        </dl>
        {replay ? (
          <p className="mt-2 text-sm text-loam-700">
            Shaded bands: {replay.replicates} replicates with chance, seed {replay.seed}.
          </p>
        ) : null}
      </section>
      <TemplateView
        definition={content.definition}
        runs={runs}
        values={values}
        replay={replay}
        large={false}
      />
      <Prompts prompts={content.prompts} handout />
      {content.card && content.profile ? (
        <SpeciesCard name={content.profile.name} card={content.card} photoUrl={photoUrl} />
      ) : null}
      <p className="text-xs text-loam-700">
        Numbers are the model’s expected values for an illustrative field; they are a teaching aid, not a
        forecast for any real field.
      </p>
    </article>
  );
}
