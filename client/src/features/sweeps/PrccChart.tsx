import { axisBottom } from 'd3-axis';
import { scaleBand, scaleLinear } from 'd3-scale';
import { useId, useRef } from 'react';
import type { SweepAnalysis } from '../../../../shared/api/sweeps';
import { chartInk } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';
import tokens from '../../../../tailwind.config';
import { AxisTitle, clip, useAxis } from './chartParts';

/*
 * Partial rank correlation of the outcome with each parameter, −1 to 1, its value written in
 * a column on the right. A bar whose p-value is below 0.05 is solid and starred; the others
 * are drawn as dashed outlines only, so significance reads without colour.
 */

const c = tokens.theme.extend.colors;
export const SIGNIFICANCE = 0.05;

type Props = {
  prcc: NonNullable<SweepAnalysis['prcc']>;
  labelOf: (path: string) => string;
  title: string;
};

export function PrccChart({ prcc, labelOf, title }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const width = useElementWidth(ref);
  const titleId = useId();
  const margin = { top: 34, right: 70, bottom: 48, left: Math.min(280, Math.max(140, width * 0.34)) };
  const rowsHeight = prcc.length * 34;
  const height = margin.top + margin.bottom + rowsHeight;
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const x = scaleLinear().domain([-1, 1]).range([0, plotWidth]);
  const y = scaleBand<string>()
    .domain(prcc.map((p) => p.path))
    .range([0, rowsHeight])
    .paddingInner(0.3);
  const xAxis = useAxis(
    axisBottom(x)
      .tickValues([-1, -0.5, 0, 0.5, 1])
      .tickFormat((d) => String(d)),
  );
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
        <g transform={`translate(${margin.left} 14)`}>
          <rect x={0} y={-9} width={14} height={10} fill={c.humus[800]} />
          <text x={20} y={0} fill={chartInk.strong}>
            p &lt; {SIGNIFICANCE} (starred)
          </text>
          <rect
            x={150}
            y={-9}
            width={14}
            height={10}
            fill="#ffffff"
            stroke={c.humus[800]}
            strokeDasharray="3 2"
          />
          <text x={170} y={0} fill={chartInk.strong}>
            not significant
          </text>
        </g>
        <g transform={`translate(${margin.left} ${margin.top})`}>
          {[-1, -0.5, 0.5, 1].map((t) => (
            <line key={t} x1={x(t)} x2={x(t)} y1={0} y2={rowsHeight} stroke={chartInk.grid} />
          ))}
          {prcc.map((p) => {
            const top = y(p.path) ?? 0;
            const h = y.bandwidth();
            const r = p.coefficient ?? 0;
            const significant = p.pValue !== null && p.pValue < SIGNIFICANCE;
            const end = x(r);
            return (
              <g key={p.path}>
                <text x={-8} y={top + h / 2} dy="0.35em" textAnchor="end" fill={chartInk.strong}>
                  <title>{labelOf(p.path)}</title>
                  {clip(labelOf(p.path), chars)}
                </text>
                <rect
                  x={Math.min(x(0), end)}
                  width={Math.max(1, Math.abs(end - x(0)))}
                  y={top}
                  height={h}
                  fill={significant ? c.humus[800] : '#ffffff'}
                  stroke={c.humus[800]}
                  strokeDasharray={significant ? undefined : '3 2'}
                />
                <text x={plotWidth + 10} y={top + h / 2} dy="0.35em" fill={chartInk.strong}>
                  {p.coefficient === null ? 'n/a' : `${p.coefficient.toFixed(2)}${significant ? ' *' : ''}`}
                </text>
              </g>
            );
          })}
          <line x1={x(0)} x2={x(0)} y1={-4} y2={rowsHeight + 4} stroke={chartInk.strong} />
          <g ref={xAxis} transform={`translate(0 ${rowsHeight})`} color={chartInk.text} />
          <AxisTitle x={plotWidth / 2} y={rowsHeight + 38}>
            Partial rank correlation coefficient
          </AxisTitle>
        </g>
      </svg>
    </div>
  );
}
