import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useId, useRef } from 'react';
import { Marker, StyleSwatch } from '../../shared/charts/marks';
import { chartInk, strategyStyles } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';

/*
 * Cumulative germination by day, one line per dish, one style (colour, dash and marker) per
 * temperature so the temperatures stay apart in grey print and for colour-blind readers.
 */

export type DishCurve = {
  testId: string;
  temperatureC: number;
  points: readonly { day: number; fraction: number }[];
};

type Props = {
  title: string;
  summary: string;
  dishes: readonly DishCurve[];
  /** Temperature as shown, in the person's units. */
  temperatureLabel: (c: number) => string;
};

export function GerminationCurves({ title, summary, dishes, temperatureLabel }: Props) {
  const containerRef = useRef<HTMLDivElement>(null);
  const width = useElementWidth(containerRef);
  const titleId = useId();
  const descId = useId();
  const height = 280;
  const margin = { top: 14, right: 20, bottom: 44, left: 56 };
  const plotWidth = Math.max(120, width - margin.left - margin.right);
  const plotHeight = height - margin.top - margin.bottom;
  const lastDay = Math.max(1, ...dishes.flatMap((d) => d.points.map((p) => p.day)));
  const x = scaleLinear().domain([0, lastDay]).nice(6).range([0, plotWidth]);
  const y = scaleLinear().domain([0, 1]).range([plotHeight, 0]);
  const temperatures = [...new Set(dishes.map((d) => d.temperatureC))].sort((a, b) => a - b);
  const styleOf = (c: number) => strategyStyles[temperatures.indexOf(c) % strategyStyles.length];
  const path = line<{ day: number; fraction: number }>()
    .x((p) => x(p.day))
    .y((p) => y(p.fraction));

  return (
    <div ref={containerRef} className="flex w-full flex-col gap-2">
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
          {[0, 0.25, 0.5, 0.75, 1].map((t) => (
            <g key={t}>
              <line x1={0} x2={plotWidth} y1={y(t)} y2={y(t)} stroke={chartInk.grid} />
              <text x={-8} y={y(t)} dy="0.32em" textAnchor="end" fill={chartInk.text}>
                {Math.round(t * 100)} %
              </text>
            </g>
          ))}
          {x.ticks(6).map((t) => (
            <text key={t} x={x(t)} y={plotHeight + 16} textAnchor="middle" fill={chartInk.text}>
              {t}
            </text>
          ))}
          <line x1={0} x2={plotWidth} y1={plotHeight} y2={plotHeight} stroke={chartInk.text} />
          <text
            x={plotWidth / 2}
            y={plotHeight + 36}
            textAnchor="middle"
            fill={chartInk.text}
            className="font-medium"
          >
            Days since sowing
          </text>
          <text
            transform={`translate(${-margin.left + 12} ${plotHeight / 2}) rotate(-90)`}
            textAnchor="middle"
            fill={chartInk.text}
            className="font-medium"
          >
            Germinated (cumulative)
          </text>
          {dishes.map((d) => {
            const style = styleOf(d.temperatureC);
            return (
              <g key={d.testId}>
                <path
                  d={path(d.points as { day: number; fraction: number }[]) ?? ''}
                  fill="none"
                  stroke={style.color}
                  strokeWidth={1.6}
                  strokeDasharray={style.dash ?? undefined}
                  opacity={0.9}
                />
                {d.points.map((p) => (
                  <Marker key={p.day} style={style} x={x(p.day)} y={y(p.fraction)} size={26} />
                ))}
              </g>
            );
          })}
        </g>
      </svg>
      <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-loam-700" aria-label="Temperatures">
        {temperatures.map((c) => (
          <li key={c} className="inline-flex items-center gap-2">
            <StyleSwatch style={styleOf(c)} />
            {temperatureLabel(c)}
          </li>
        ))}
      </ul>
    </div>
  );
}
