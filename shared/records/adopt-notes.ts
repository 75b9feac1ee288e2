// The source note an adopted estimate leaves on its target, composed the same way on the
// server (which writes it) and in the browser (which shows it before the person confirms).
import type { Adoptable, AdoptTarget } from '../api/records';

/** Plain numbers for notes: three significant digits, thousands grouped. */
export function num(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(x)));
  const decimals = Math.max(0, digits - 1 - magnitude);
  return x.toLocaleString('en-US', {
    maximumFractionDigits: Math.min(decimals, 6),
    minimumFractionDigits: 0,
  });
}

export const AGE_CLASS = /^germination\.shallowByAge\[(\d+)\]$/;

type SeedbankTarget = Extract<AdoptTarget, { kind: 'field-seedbank' }>;

/**
 * The initial seedbank the chosen layers give. Densities per layer are seeds per m² of ground,
 * so stacked layers add up; a side with no layer chosen keeps its value.
 */
export function seedbankFromLayers(
  layers: readonly { layer: string; seedsPerM2: number }[],
  target: SeedbankTarget,
  previous: { shallow: number; deep: number },
): { shallow: number; deep: number } {
  const sum = (chosen: readonly string[]) =>
    layers.filter((l) => chosen.includes(l.layer)).reduce((s, l) => s + l.seedsPerM2, 0);
  return {
    shallow: target.shallowLayers.length ? sum(target.shallowLayers) : previous.shallow,
    deep: target.deepLayers.length ? sum(target.deepLayers) : previous.deep,
  };
}

/** The note written to the target: the estimate's own note, prefixed with what it set where that is not obvious. */
export function adoptedNote(
  estimate: Pick<Adoptable, 'note' | 'layers'>,
  target: AdoptTarget,
  previousSeedbank: { shallow: number; deep: number },
): string {
  if (target.kind === 'profile') {
    const age = AGE_CLASS.exec(target.parameter);
    return age ? `Age class ${age[1]}: ${estimate.note}` : estimate.note;
  }
  if (target.kind === 'field-seedbank') {
    const value = seedbankFromLayers(estimate.layers ?? [], target, previousSeedbank);
    const side = (name: string, chosen: readonly string[], v: number) =>
      chosen.length ? `${name} ${num(v)} seeds/m² (${chosen.join(' + ')})` : `${name} unchanged`;
    return `Initial seedbank ${side('shallow', target.shallowLayers, value.shallow)}, ${side('deep', target.deepLayers, value.deep)}. ${estimate.note}`;
  }
  return estimate.note;
}
