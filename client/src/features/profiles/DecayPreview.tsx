import { useMemo, useState } from 'react';
import { projectMeanField } from '../../../../models/projection/mean-field';
import type { FieldSetting, Scenario, SpeciesProfile } from '../../../../models/scenario/types';
import { LineChart, type LineSeries } from '../../shared/charts/LineChart';
import { conversion, formatNumber } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { decayOnlyHalfLife, halfLifeYears } from './halfLife';

/*
 * The instant preview beside the profile editor: the engine's own deterministic
 * mean-field projection, run in the browser on a fixed lesson field that holds only a
 * seedbank. No plants stand at the start, no seed arrives from outside and the seedlings
 * that emerge set no seed, so the curves show what the profile alone does to a seedbank:
 * germination draws seeds out of the shallow layer and decay removes them from both.
 * Forty years at least, because buried seed of some weeds stays viable for longer than
 * that (common practice, no published source).
 */

export const PREVIEW_YEARS = 40;
const START_PER_LAYER = 1000;

const lessonField: FieldSetting = {
  name: 'Lesson field (seedbank only)',
  areaHa: 1,
  initialSeedbank: { shallow: START_PER_LAYER, deep: START_PER_LAYER },
  initialPlants: 0,
  immigrantSeedRain: 0,
  cropValuePerHa: 0,
  yieldLoss: { I: 0, A: 50 },
  cropCompetition: 0,
};

function lessonScenario(profile: SpeciesProfile): Scenario {
  return {
    profile: { ...profile, fecundity: { ...profile.fecundity, maxSeedsPerPlant: 0 } },
    field: lessonField,
    strategy: { name: 'No steps', steps: [] },
    horizonYears: PREVIEW_YEARS,
    replicates: 1,
    seed: 1,
    efficacyDraw: 'per-replicate',
    depletionThreshold: 1,
    discountRate: 0,
  };
}

function years(t: number | null): string {
  if (t === null) return `more than ${PREVIEW_YEARS} years`;
  if (t < 1) return 'under a year';
  const shown = formatNumber(t, 1);
  return shown === '1' ? '1 year' : `${shown} years`;
}

type Preview = {
  shallow: Float64Array;
  deep: Float64Array;
  decay: { shallow: number; deep: number };
};

function compute(profile: SpeciesProfile): Preview | null {
  try {
    const { series } = projectMeanField(lessonScenario(profile));
    return {
      shallow: series.seedbankShallow,
      deep: series.seedbankDeep,
      decay: profile.seedDecay,
    };
  } catch {
    // The schema accepted the profile, so the engine only refuses extreme growth; say so below.
    return null;
  }
}

/** `profile` is null while a field holds an invalid value; the last valid curves stay on show. */
export function DecayPreview({ profile }: { profile: SpeciesProfile | null }) {
  const { system } = useUnits();
  const [shownProfile, setShownProfile] = useState(profile);
  // Remember the last valid profile (React's "adjust state while rendering" pattern).
  if (profile !== null && profile !== shownProfile) setShownProfile(profile);
  const preview = useMemo(() => (shownProfile ? compute(shownProfile) : null), [shownProfile]);
  const density = conversion('seeds/m²', system);

  if (!preview) {
    return <p className="text-sm text-loam-700">The preview appears when every field holds a valid value.</p>;
  }

  const points = (values: Float64Array) => Array.from(values, (v, t) => ({ x: t, y: density.toShown(v) }));
  const series: LineSeries[] = [
    { id: 'shallow', label: 'Shallow', points: points(preview.shallow), tone: 'loam' },
    { id: 'deep', label: 'Deep', points: points(preview.deep), tone: 'clay' },
  ];
  const shallowHalf = halfLifeYears(preview.shallow);
  const deepHalf = halfLifeYears(preview.deep);
  const left = (values: Float64Array) => {
    const percent = (100 * values[PREVIEW_YEARS]) / values[0];
    return percent < 0.05 ? 'under 0.1' : formatNumber(percent, 1);
  };
  const start = formatNumber(density.toShown(START_PER_LAYER), 1);

  return (
    <div className="flex flex-col gap-4">
      {profile === null ? (
        <p className="rounded-seed bg-clay-100 px-3 py-2 text-sm text-humus-900">
          Showing the last valid values: fix the field marked ✕ to update the preview.
        </p>
      ) : null}
      <LineChart
        title="Seedbank decay by layer over 40 years"
        description={`Mean-field projection on a lesson field starting with ${start} ${density.unit} in each layer, no plants and no new seed. Shallow half-life ${years(shallowHalf)}, deep half-life ${years(deepHalf)}.`}
        series={series}
        xLabel="Years"
        yLabel={`Viable seeds (${density.unit})`}
        xDomain={[0, PREVIEW_YEARS]}
        guide={{ y: density.toShown(START_PER_LAYER / 2), label: 'half of each layer’s start' }}
        markers={[
          ...(shallowHalf === null
            ? []
            : [{ x: shallowHalf, label: `Shallow half-life ${years(shallowHalf)}`, tone: 'loam' as const }]),
          ...(deepHalf === null
            ? []
            : [{ x: deepHalf, label: `Deep half-life ${years(deepHalf)}`, tone: 'clay' as const }]),
        ]}
        tableX={[0, 5, 10, 20, 30, 40]}
      />
      <dl className="grid grid-cols-2 gap-3 text-sm">
        <HalfLife
          layer="Shallow layer"
          swatch="bg-loam-600"
          curve={shallowHalf}
          decayOnly={decayOnlyHalfLife(preview.decay.shallow)}
          left={left(preview.shallow)}
        />
        <HalfLife
          layer="Deep layer"
          swatch="bg-clay-600"
          curve={deepHalf}
          decayOnly={decayOnlyHalfLife(preview.decay.deep)}
          left={left(preview.deep)}
        />
      </dl>
      <p className="text-xs text-loam-700">
        Lesson field: {start} {density.unit} in each layer, no plants, no seed rain; seedlings that emerge set
        no seed. Germination removes shallow seed on top of decay, so the shallow half-life is shorter than
        decay alone gives. Computed instantly in your browser with the engine’s deterministic mean field.
      </p>
    </div>
  );
}

function HalfLife({
  layer,
  swatch,
  curve,
  decayOnly,
  left,
}: {
  layer: string;
  swatch: string;
  curve: number | null;
  decayOnly: number | null;
  left: string;
}) {
  return (
    <div className="rounded-seed bg-silt-100 px-3 py-2">
      <dt className="flex items-center gap-2 font-medium text-humus-900">
        <span className={`inline-block size-2.5 rounded-full ${swatch}`} aria-hidden="true" />
        {layer}
      </dt>
      <dd className="mt-1">
        <span className="font-display text-xl font-semibold text-humus-900">{years(curve)}</span>{' '}
        <span className="text-loam-700">half-life</span>
      </dd>
      <dd className="text-loam-700">decay alone: {decayOnly === null ? 'no decay' : years(decayOnly)}</dd>
      <dd className="text-loam-700">
        {left}% left after {PREVIEW_YEARS} years
      </dd>
    </div>
  );
}
