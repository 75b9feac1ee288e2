import { checkCount, checkLabel, checkPositive } from './checks';
import { estimateCountDensity, type CountDensity, type DensityOptions } from './count-density';
import type { Estimate } from './estimate';
import { RecordsError, type RecordIssue } from './records-error';
import { estimatePerSquareFoot } from './units';

/**
 * One soil sample as it comes from the field: `cores` cores of one diameter taken from one layer
 * (1 for a single core, more when cores were pooled before counting), and the seeds counted — or
 * seedlings emerged, for the emergence method — in it.
 */
export interface SoilCoreSample {
  /** The layer the cores were cut into, e.g. "0–5 cm"; samples are grouped by this label. */
  layer: string;
  coreDiameterCm: number;
  cores: number;
  count: number;
}

export interface SeedbankLayerDensity extends CountDensity {
  layer: string;
  cores: number;
  /** The same density and limits per ft² (NIST SP 811 factor). */
  perFt2: Estimate;
}

/** Surface area of one core of diameter d cm, in m²: π·(d/2)² with d in metres. */
export function coreAreaM2(diameterCm: number): number {
  const radiusM = diameterCm / 200;
  return Math.PI * radiusM * radiusM;
}

/**
 * Seeds/m² (and per ft²) per layer, in the order layers first appear. Each sample's area is
 * cores × core area, so pooled and single-core samples mix freely; the interval method per layer is
 * chosen by `estimateCountDensity` from the spread of the per-sample counts.
 */
export function estimateSeedbankDensity(
  samples: readonly SoilCoreSample[],
  options: DensityOptions = {},
): SeedbankLayerDensity[] {
  const issues: RecordIssue[] = [];
  if (samples.length === 0) issues.push({ index: null, message: 'no soil samples were given' });
  samples.forEach((s, index) => {
    checkLabel(issues, index, s.layer, 'layer');
    checkPositive(issues, index, s.coreDiameterCm, 'core diameter (cm)');
    if (checkCount(issues, index, s.cores, 'number of cores') && s.cores === 0) {
      issues.push({ index, message: 'number of cores must be at least 1' });
    }
    checkCount(issues, index, s.count, 'seeds counted');
  });
  if (issues.length > 0) throw new RecordsError('soil seedbank samples', issues);

  const layers = new Map<string, SoilCoreSample[]>();
  for (const s of samples) {
    const key = s.layer.trim();
    const list = layers.get(key);
    if (list) list.push(s);
    else layers.set(key, [s]);
  }
  return [...layers].map(([layer, list]) => {
    const density = estimateCountDensity(
      list.map((s) => ({ count: s.count, areaM2: s.cores * coreAreaM2(s.coreDiameterCm) })),
      options,
    );
    return {
      layer,
      cores: list.reduce((sum, s) => sum + s.cores, 0),
      ...density,
      perFt2: estimatePerSquareFoot(density.perM2),
    };
  });
}
