import { scaleBand, scaleLinear } from 'd3-scale';
import { useId, useRef } from 'react';
import { chartInk } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';

/*
 * Horizontal bars with their interval drawn as a whisker: one bar per estimate, the value
 * written at the end of the whisker so the chart reads without a legend and prints in grey.
 * d3 does the scales; React draws the SVG. The same numbers are in the table beside it.
 */

export type IntervalBar = {
  key: string;
  label: string;
  value: number;
  lower: number;
  upper: number;
  color: string;
  /** A line above the bar that groups bars (e.g. the year of a sampling). */
  group?: string;
};

type IntervalBarsProps = {
  title: string;
  summary: string;
  bars: readonly IntervalBar[];
  xLabel: string;
  format: (x: number) => string;
  /** Fixed axis ends, e.g. 0–100 %; otherwise 0 to the largest upper limit. */
  domain?: [number, number];
};

const ROW = 30;

export function IntervalBars({ title, summary, bars, xLabel, format, domain }: IntervalBarsProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const width = useElementWidth(containerRef);
  const titleId = useId();
  const descId = useId();
  const margin = { top: 12, right: 88, bottom: 42, left: Math.min(240, Math.max(120, width * 0.32)) };
  const groups = bars.filter((b, i) => b.group !== undefined && b.group !== bars[i - 1]?.group).length;
  const height = margin.top + margin.bottom + bars.length * ROW + groups * 18;
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const low = domain?.[0] ?? Math.min(0, ...bars.map((b) => b.lower));
  const high = domain?.[1] ?? Math.max(1e-9, ...bars.map((b) => b.upper));
  const x = scaleLinear().domain([low, high]).nice(5).range([0, plotWidth]);
  const ticks = x.ticks(5);

  // Each bar's top, leaving room for a group heading wherever the group changes.
  const startsGroup = (i: number) => bars[i].group !== undefined && bars[i].group !== bars[i - 1]?.group;
  const placed = bars.map((b, i) => {
    const headingsSoFar = bars.slice(0, i + 1).filter((_, j) => startsGroup(j)).length;
    return { ...b, top: margin.top + i * ROW + headingsSoFar * 18, heading: startsGroup(i) };
  });
  const band = scaleBand().domain(['bar']).range([0, ROW]).padding(0.28);

  return (
    <div ref={containerRef} className="w-full">
      <svg
        data-chart=""
        role="img"
        aria-labelledby={titleId}
        aria-describedby={descId}
        width={width}
        height={height}
        className="block font-sans text-xs"
        style={{ fontVariantNumeric: 'tabular-nums' }}
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{summary}</desc>
        <g transform={`translate(${margin.left} 0)`}>
          {ticks.map((t) => (
            <g key={t}>
              <line x1={x(t)} x2={x(t)} y1={margin.top} y2={height - margin.bottom} stroke={chartInk.grid} />
              <text x={x(t)} y={height - margin.bottom + 16} textAnchor="middle" fill={chartInk.text}>
                {format(t)}
              </text>
            </g>
          ))}
          <line x1={x(0)} x2={x(0)} y1={margin.top} y2={height - margin.bottom} stroke={chartInk.text} />
          <text
            x={plotWidth / 2}
            y={height - 8}
            textAnchor="middle"
            fill={chartInk.text}
            className="font-medium"
          >
            {xLabel}
          </text>
        </g>
        {placed.map((b) => {
          const barTop = b.top + (band('bar') ?? 0);
          const mid = b.top + ROW / 2;
          const start = x(Math.min(0, b.value));
          const end = x(Math.max(0, b.value));
          return (
            <g key={b.key}>
              {b.heading ? (
                <text x={8} y={b.top - 5} fill={chartInk.strong} className="font-semibold">
                  {b.group}
                </text>
              ) : null}
              <text x={margin.left - 8} y={mid} dy="0.32em" textAnchor="end" fill={chartInk.strong}>
                {b.label.length > 34 ? `${b.label.slice(0, 33)}…` : b.label}
              </text>
              <g transform={`translate(${margin.left} 0)`}>
                <rect
                  x={start}
                  y={barTop}
                  width={Math.max(1, end - start)}
                  height={band.bandwidth()}
                  fill={b.color}
                  opacity={0.85}
                />
                <line
                  x1={x(b.lower)}
                  x2={x(b.upper)}
                  y1={mid}
                  y2={mid}
                  stroke={chartInk.strong}
                  strokeWidth={1.5}
                />
                {[b.lower, b.upper].map((v, i) => (
                  <line
                    key={i}
                    x1={x(v)}
                    x2={x(v)}
                    y1={mid - 6}
                    y2={mid + 6}
                    stroke={chartInk.strong}
                    strokeWidth={1.5}
                  />
                ))}
                <text x={x(b.upper) + 6} y={mid} dy="0.32em" fill={chartInk.strong}>
                  {format(b.value)}
                </text>
              </g>
            </g>
          );
        })}
      </svg>
    </div>
  );
}
