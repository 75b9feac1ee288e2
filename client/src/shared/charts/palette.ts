import tokens from '../../../../tailwind.config';

/*
 * How chart lines are told apart. Colour alone fails for colour-blind readers and on a
 * black-and-white printout, so each style pairs a soil colour from the design tokens with
 * its own dash pattern and point marker; any two styles differ in all three. Every
 * colour keeps at least 3:1 contrast with the white chart sheet (WCAG 2.2, 1.4.11
 * non-text contrast). The living green stays reserved for plants, as everywhere else.
 */

const c = tokens.theme.extend.colors;

export type MarkerKind = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'star' | 'ring' | 'none';

export type SeriesStyle = {
  color: string;
  /** SVG stroke-dasharray; null for a solid line. */
  dash: string | null;
  marker: MarkerKind;
  /** Line width in px. */
  width: number;
};

/** Styles for up to six compared strategies, in order. */
export const strategyStyles: readonly SeriesStyle[] = [
  { color: c.humus[900], dash: null, marker: 'circle', width: 2.25 },
  { color: c.russet[600], dash: '8 4', marker: 'square', width: 2.25 },
  { color: c.clay[600], dash: '2 3', marker: 'triangle', width: 2.5 },
  { color: c.loam[500], dash: '9 3 2 3', marker: 'diamond', width: 2.25 },
  { color: c.russet[800], dash: '14 4', marker: 'cross', width: 2.25 },
  { color: c.clay[800], dash: '4 2 1 2', marker: 'star', width: 2.25 },
];

/** No control: the reference every comparison carries, drawn paler with open rings. */
export const baselineStyle: SeriesStyle = { color: c.loam[400], dash: '1 4', marker: 'ring', width: 2.75 };

/** The deterministic mean-field projection laid over a band. */
export const meanFieldStyle: SeriesStyle = { color: c.humus[700], dash: '6 4', marker: 'none', width: 1.5 };

/** One measure of one projection: seeds in seed-coat russet, layers in their horizon colours, plants green. */
export const measureStyles = {
  seedbankTotal: { color: c.russet[700], dash: null, marker: 'circle', width: 2.25 },
  seedbankShallow: { color: c.loam[600], dash: null, marker: 'square', width: 2.25 },
  seedbankDeep: { color: c.clay[600], dash: '8 4', marker: 'triangle', width: 2.25 },
  established: { color: c.sprout[700], dash: null, marker: 'circle', width: 2.25 },
  flowering: { color: c.sprout[600], dash: null, marker: 'diamond', width: 2.25 },
  depletion: { color: c.humus[800], dash: null, marker: 'none', width: 1 },
} as const satisfies Record<string, SeriesStyle>;

/** Chart furniture: gridlines, axes, text. */
export const chartInk = {
  grid: c.silt[200],
  text: c.loam[700],
  strong: c.humus[900],
};
