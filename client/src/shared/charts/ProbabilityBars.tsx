import { axisBottom, axisLeft } from 'd3-axis';
import { scaleBand, scaleLinear } from 'd3-scale';
import { select } from 'd3-selection';
import { useId, useLayoutEffect, useMemo, useRef } from 'react';
import { chartInk } from './palette';
import { useElementWidth } from './useElementWidth';

/*
 * A probability for each year as a bar from 0 to 100 %, with the value written above
 * each bar that has room, so the chart reads without a legend and prints in grey.
 */

type ProbabilityBarsProps = {
  title: string;
  summary: string;
  x: readonly number[];
  /** Probabilities in [0, 1]. */
  values: readonly number[];
  color: string;
  yLabel: string;
  xLabel?: string;
  height?: number;
};

const percent = (p: number) => `${Math.round(p * 100)} %`;

export function ProbabilityBars({
  title,
  summary,
  x,
  values,
  color,
  yLabel,
  xLabel = 'Year',
  height = 240,
}: ProbabilityBarsProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const width = useElementWidth(containerRef);
  const xAxisRef = useRef<SVGGElement>(null);
  const yAxisRef = useRef<SVGGElement>(null);
  const titleId = useId();
  const descId = useId();

  const margin = { top: 22, right: 16, bottom: 44, left: 72 };
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const plotHeight = height - margin.top - margin.bottom;
  const xs = useMemo(
    () =>
      scaleBand<number>()
        .domain([...x])
        .range([0, plotWidth])
        .paddingInner(0.25)
        .paddingOuter(0.1),
    [x, plotWidth],
  );
  const y = useMemo(() => scaleLinear().domain([0, 1]).range([plotHeight, 0]), [plotHeight]);
  const ticks = [0, 0.25, 0.5, 0.75, 1];

  useLayoutEffect(() => {
    if (!xAxisRef.current || !yAxisRef.current) return;
    const every = x.length > 16 ? Math.ceil(x.length / 12) : 1;
    const xAxis = axisBottom(xs)
      .tickValues(x.filter((_, i) => i % every === 0))
      .tickFormat((d) => String(d))
      .tickSizeOuter(0);
    const yAxis = axisLeft(y)
      .tickValues(ticks)
      .tickFormat((d) => percent(Number(d)))
      .tickSize(0)
      .tickPadding(8);
    select(xAxisRef.current).call(xAxis).attr('font-family', null).attr('font-size', null);
    select(yAxisRef.current)
      .call(yAxis)
      .attr('font-family', null)
      .attr('font-size', null)
      .call((g) => g.select('.domain').remove());
  });

  const labelled = xs.bandwidth() >= 26;

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
        <g transform={`translate(${margin.left} ${margin.top})`}>
          {ticks.map((t) => (
            <line key={t} x1={0} x2={plotWidth} y1={y(t)} y2={y(t)} stroke={chartInk.grid} />
          ))}
          {x.map((year, i) => {
            const p = values[i] ?? 0;
            const left = xs(year) ?? 0;
            return (
              <g key={year}>
                <rect
                  x={left}
                  width={xs.bandwidth()}
                  y={y(p)}
                  height={Math.max(0, plotHeight - y(p))}
                  fill={color}
                />
                {/* A hairline at 0 so a year with no chance of depletion still shows its slot. */}
                <line
                  x1={left}
                  x2={left + xs.bandwidth()}
                  y1={plotHeight - 0.5}
                  y2={plotHeight - 0.5}
                  stroke={color}
                />
                {labelled ? (
                  <text x={left + xs.bandwidth() / 2} y={y(p) - 5} textAnchor="middle" fill={chartInk.strong}>
                    {percent(p)}
                  </text>
                ) : null}
              </g>
            );
          })}
          <g ref={xAxisRef} transform={`translate(0 ${plotHeight})`} color={chartInk.text} />
          <g ref={yAxisRef} color={chartInk.text} />
          <text
            x={plotWidth / 2}
            y={plotHeight + 36}
            textAnchor="middle"
            fill={chartInk.text}
            className="font-medium"
          >
            {xLabel}
          </text>
          <text
            transform={`translate(${-margin.left + 12} ${plotHeight / 2}) rotate(-90)`}
            textAnchor="middle"
            fill={chartInk.text}
            className="font-medium"
          >
            {yLabel}
          </text>
        </g>
      </svg>
    </div>
  );
}
