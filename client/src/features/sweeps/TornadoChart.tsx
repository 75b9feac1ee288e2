import { axisBottom } from 'd3-axis';
import { scaleBand, scaleLinear } from 'd3-scale';
import { useId, useRef } from 'react';
import type { SweepAnalysis } from '../../../../shared/api/sweeps';
import { chartInk } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';
import tokens from '../../../../tailwind.config';
import { AxisTitle, clip, useAxis } from './chartParts';

/*
 * One-at-a-time result as a tornado: per parameter, how far the outcome moves from the base
 * point (the vertical line) when that parameter alone is set to its min (clay, hatched) and
 * to its max (russet, solid); the longest swing on top. Hatching tells the ends apart on a
 * grey printout and for readers who do not see the colours.
 */

const c = tokens.theme.extend.colors;
const LOW = c.clay[600];
const HIGH = c.russet[700];

type Props = {
  tornado: NonNullable<SweepAnalysis['tornado']>;
  labelOf: (path: string) => string;
  /** Outcome values as shown (converted to the unit system). */
  toShown: (value: number) => number;
  format: (value: number) => string;
  xLabel: string;
  title: string;
};

export function TornadoChart({ tornado, labelOf, toShown, format, xLabel, title }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const width = useElementWidth(ref);
  const hatch = useId();
  const titleId = useId();
  const bars = tornado.bars;
  const margin = { top: 34, right: 24, bottom: 48, left: Math.min(280, Math.max(140, width * 0.34)) };
  const height = margin.top + margin.bottom + bars.length * 38;
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const values = [tornado.baseOutcome, ...bars.flatMap((b) => [b.outcomeAtLow, b.outcomeAtHigh])].map(
    toShown,
  );
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = (hi - lo || Math.abs(hi) || 1) * 0.08;
  const x = scaleLinear()
    .domain([lo - pad, hi + pad])
    .range([0, plotWidth])
    .nice();
  const y = scaleBand<string>()
    .domain(bars.map((b) => b.path))
    .range([0, bars.length * 38])
    .paddingInner(0.3);
  const xAxis = useAxis(
    axisBottom(x)
      .ticks(Math.max(2, Math.floor(plotWidth / 90)))
      .tickFormat((d) => format(Number(d))),
  );
  const base = x(toShown(tornado.baseOutcome));
  const chars = Math.floor(margin.left / 6.8);

  return (
    <div ref={ref} className="w-full">
      <svg
        data-chart=""
        role="img"
        aria-labelledby={titleId}
        width={width}
        height={height}
        className="block font-sans text-xs"
        style={{ fontVariantNumeric: 'tabular-nums' }}
      >
        <title id={titleId}>{title}</title>
        <defs>
          <pattern
            id={hatch}
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="6" height="6" fill={LOW} fillOpacity="0.35" />
            <line x1="0" y1="0" x2="0" y2="6" stroke={LOW} strokeWidth="3" />
          </pattern>
        </defs>
        <g transform={`translate(${margin.left} 14)`}>
          <rect x={0} y={-9} width={14} height={10} fill={`url(#${hatch})`} stroke={LOW} />
          <text x={20} y={0} fill={chartInk.strong}>
            parameter at its min
          </text>
          <rect x={150} y={-9} width={14} height={10} fill={HIGH} />
          <text x={170} y={0} fill={chartInk.strong}>
            at its max
          </text>
        </g>
        <g transform={`translate(${margin.left} ${margin.top})`}>
          {x.ticks(Math.max(2, Math.floor(plotWidth / 90))).map((t) => (
            <line key={t} x1={x(t)} x2={x(t)} y1={0} y2={bars.length * 38} stroke={chartInk.grid} />
          ))}
          {bars.map((b) => {
            const top = y(b.path) ?? 0;
            const h = y.bandwidth();
            const low = x(toShown(b.outcomeAtLow));
            const high = x(toShown(b.outcomeAtHigh));
            return (
              <g key={b.path}>
                <text x={-8} y={top + h / 2} dy="0.35em" textAnchor="end" fill={chartInk.strong}>
                  <title>{labelOf(b.path)}</title>
                  {clip(labelOf(b.path), chars)}
                </text>
                <rect
                  x={Math.min(base, low)}
                  width={Math.max(1, Math.abs(low - base))}
                  y={top}
                  height={h / 2}
                  fill={`url(#${hatch})`}
                  stroke={LOW}
                />
                <rect
                  x={Math.min(base, high)}
                  width={Math.max(1, Math.abs(high - base))}
                  y={top + h / 2}
                  height={h / 2}
                  fill={HIGH}
                />
              </g>
            );
          })}
          <line
            x1={base}
            x2={base}
            y1={-6}
            y2={bars.length * 38 + 4}
            stroke={chartInk.strong}
            strokeWidth={1.5}
          />
          <g ref={xAxis} transform={`translate(0 ${bars.length * 38})`} color={chartInk.text} />
          <AxisTitle x={plotWidth / 2} y={bars.length * 38 + 38}>
            {xLabel}
          </AxisTitle>
        </g>
      </svg>
    </div>
  );
}
