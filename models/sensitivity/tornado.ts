// Tornado chart data from a one-at-a-time design: how far the outcome moves when each parameter
// alone goes from its min to its max, the others held at base.
import type { SweepParameter } from './design';
import { assertFiniteOutcomes, assertOutcomeCount } from './outcomes';

export interface TornadoBar {
  path: string;
  /** The parameter's min and max, the two ends of its bar. */
  low: number;
  high: number;
  outcomeAtLow: number;
  outcomeAtHigh: number;
  /** |outcomeAtHigh − outcomeAtLow|: the bar's length. */
  swing: number;
}

export interface Tornado {
  /** Outcome with every parameter at base (point 0), where the bars meet. */
  baseOutcome: number;
  /** Longest swing first; equal swings keep the parameters' order. */
  bars: TornadoBar[];
}

/** outcomes[i] is the outcome of point i of designPoints(params, { kind: 'one-at-a-time' }, …). */
export function tornado(params: readonly SweepParameter[], outcomes: readonly number[]): Tornado {
  assertOutcomeCount(outcomes, 2 * params.length + 1, 'one-at-a-time');
  assertFiniteOutcomes(outcomes);
  const bars = params.map((p, i) => {
    const outcomeAtLow = outcomes[1 + 2 * i];
    const outcomeAtHigh = outcomes[2 + 2 * i];
    return {
      path: p.path,
      low: p.min,
      high: p.max,
      outcomeAtLow,
      outcomeAtHigh,
      swing: Math.abs(outcomeAtHigh - outcomeAtLow),
    };
  });
  // Array.prototype.sort is stable (ES2019), so ties stay in parameter order.
  bars.sort((x, y) => y.swing - x.swing);
  return { baseOutcome: outcomes[0], bars };
}
