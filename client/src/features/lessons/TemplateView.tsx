import type { LessonDefinition, ReplayResponse } from '../../../../shared/api/lessons';
import type { SliderValues } from '../../../../shared/lessons/runs';
import type { ComputedRun } from './useLessonRuns';
import { DecayView } from './views/DecayView';
import { RegrowthView } from './views/RegrowthView';
import { SeedSetView } from './views/SeedSetView';
import { StageView } from './views/StageView';

type TemplateViewProps = {
  definition: LessonDefinition;
  runs: readonly ComputedRun[];
  values: SliderValues;
  replay: ReplayResponse | null;
  large: boolean;
};

/** The charts and figures of the lesson's template at the current slider values. */
export function TemplateView({ definition, runs, values, replay, large }: TemplateViewProps) {
  const { horizonYears } = definition.settings;
  switch (definition.template) {
    case 'seedbank-decay':
      return (
        <DecayView
          runs={runs}
          values={values}
          horizonYears={horizonYears}
          startScale={definition.settings.scale}
          replay={replay}
          large={large}
        />
      );
    case 'one-year-seed-set':
      return (
        <SeedSetView runs={runs} values={values} horizonYears={horizonYears} replay={replay} large={large} />
      );
    case 'annual-vs-perennial':
      return <RegrowthView runs={runs} horizonYears={horizonYears} replay={replay} large={large} />;
    case 'which-stage':
      return (
        <StageView
          runs={runs}
          horizonYears={horizonYears}
          efficacy={values.controlEfficacy}
          replay={replay}
          large={large}
        />
      );
  }
}
