import { axisBottom } from 'd3-axis';
import { scaleBand, scaleLinear } from 'd3-scale';
import { useId, useRef } from 'react';
import type { SweepAnalysis } from '../../../../shared/api/sweeps';
import { chartInk } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';
import tokens from '../../../../tailwind.config';
import { AxisTitle, clip, useAxis } from './chartParts';

/*
 * Sobol' indices per parameter: first order (the share of the outcome's variance the
 * parameter explains alone; filled circle) and total (with all its interactions; open
 * square), each with its bootstrap interval as a whisker. A total well above the first
 * order means the parameter acts through interactions.
 */

const c = tokens.theme.extend.colors;
const FIRST = c.humus[900];
const TOTAL = c.russet[700];

type Props = {
  sobol: NonNullable<SweepAnalysis['sobol']>;
  labelOf: (path: string) => string;
  title: string;
};

export function SobolChart({ sobol, labelOf, title }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const width = useElementWidth(ref);
  const titleId = useId();
  const margin = { top: 34, right: 24, bottom: 48, left: Math.min(280, Math.max(140, width * 0.34)) };
  const rowsHeight = sobol.indices.length * 46;
  const height = margin.top + margin.bottom + rowsHeight;
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const numbers = sobol.indices.flatMap((s) => [
    s.first.low,
    s.first.high,
    s.total.low,
    s.total.high,
    s.first.value,
    s.total.value,
  ]);
  const finite = numbers.filter((v): v is number => v !== null);
  const x = scaleLinear()
    .domain([Math.min(0, ...finite), Math.max(1, ...finite)])
    .range([0, plotWidth])
    .nice();
  const y = scaleBand<string>()
    .domain(sobol.indices.map((s) => s.path))
    .range([0, rowsHeight])
    .paddingInner(0.25);
  const xAxis = useAxis(axisBottom(x).ticks(6));
  const chars = Math.floor(margin.left / 6.8);

  const mark = (
    e: { value: number | null; low: number | null; high: number | null },
    at: number,
    kind: 'first' | 'total',
  ) => {
    if (e.value === null) return null;
    const color = kind === 'first' ? FIRST : TOTAL;
    return (
      <g>
        {e.low !== null && e.high !== null ? (
          <>
            <line x1={x(e.low)} x2={x(e.high)} y1={at} y2={at} stroke={color} strokeWidth={1.5} />
            <line x1={x(e.low)} x2={x(e.low)} y1={at - 4} y2={at + 4} stroke={color} strokeWidth={1.5} />
            <line x1={x(e.high)} x2={x(e.high)} y1={at - 4} y2={at + 4} stroke={color} strokeWidth={1.5} />
          </>
        ) : null}
        {kind === 'first' ? (
          <circle cx={x(e.value)} cy={at} r={4.5} fill={color} />
        ) : (
          <rect
            x={x(e.value) - 4.5}
            y={at - 4.5}
            width={9}
            height={9}
            fill="#ffffff"
            stroke={color}
            strokeWidth={2}
          />
        )}
      </g>
    );
  };

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
        <g transform={`translate(${margin.left} 14)`}>
          <circle cx={6} cy={-4} r={4.5} fill={FIRST} />
          <text x={16} y={0} fill={chartInk.strong}>
            first order
          </text>
          <rect x={110} y={-8.5} width={9} height={9} fill="#ffffff" stroke={TOTAL} strokeWidth={2} />
          <text x={126} y={0} fill={chartInk.strong}>
            total
          </text>
          <text x={180} y={0} fill={chartInk.text}>
            whiskers: {Math.round(sobol.confidence * 100)} % bootstrap interval
          </text>
        </g>
        <g transform={`translate(${margin.left} ${margin.top})`}>
          {x.ticks(6).map((t) => (
            <line key={t} x1={x(t)} x2={x(t)} y1={0} y2={rowsHeight} stroke={chartInk.grid} />
          ))}
          {sobol.indices.map((s) => {
            const top = y(s.path) ?? 0;
            const h = y.bandwidth();
            return (
              <g key={s.path}>
                <text x={-8} y={top + h / 2} dy="0.35em" textAnchor="end" fill={chartInk.strong}>
                  <title>{labelOf(s.path)}</title>
                  {clip(labelOf(s.path), chars)}
                </text>
                {mark(s.first, top + h * 0.3, 'first')}
                {mark(s.total, top + h * 0.75, 'total')}
              </g>
            );
          })}
          <line x1={x(0)} x2={x(0)} y1={0} y2={rowsHeight} stroke={chartInk.strong} />
          <g ref={xAxis} transform={`translate(0 ${rowsHeight})`} color={chartInk.text} />
          <AxisTitle x={plotWidth / 2} y={rowsHeight + 38}>
            Share of the outcome’s variance
          </AxisTitle>
        </g>
      </svg>
    </div>
  );
}
