import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useId, useRef } from 'react';
import { useElementWidth } from './useElementWidth';

/*
 * A small line chart for deterministic series (a mean-field preview, a decay curve).
 * d3 only does the arithmetic (scales, ticks, path strings); React draws the SVG, so the
 * chart renders in one pass, prints, and needs no DOM access. The numbers behind it are
 * also given as a table for screen readers.
 */

export type LineTone = 'humus' | 'loam' | 'clay' | 'russet' | 'sprout';

export type LineSeries = {
  id: string;
  label: string;
  points: ReadonlyArray<{ x: number; y: number }>;
  tone: LineTone;
  dashed?: boolean;
};

/** A vertical guide at x, e.g. a half-life. */
export type LineMarker = { x: number; label: string; tone: LineTone };

type LineChartProps = {
  /** The accessible name of the chart. */
  title: string;
  /** One or two sentences saying what the chart shows. */
  description: string;
  series: readonly LineSeries[];
  xLabel: string;
  yLabel: string;
  xDomain: [number, number];
  formatY?: (y: number) => string;
  markers?: readonly LineMarker[];
  /** A horizontal reference line, e.g. half of the starting value. */
  guide?: { y: number; label: string };
  /** x values listed in the screen-reader table. */
  tableX: readonly number[];
  height?: number;
};

const strokes: Record<LineTone, string> = {
  humus: 'stroke-humus-900',
  loam: 'stroke-loam-600',
  clay: 'stroke-clay-600',
  russet: 'stroke-russet-600',
  sprout: 'stroke-sprout-600',
};
const fills: Record<LineTone, string> = {
  humus: 'fill-humus-900',
  loam: 'fill-loam-700',
  clay: 'fill-clay-700',
  russet: 'fill-russet-700',
  sprout: 'fill-sprout-700',
};
const swatches: Record<LineTone, string> = {
  humus: 'bg-humus-900',
  loam: 'bg-loam-600',
  clay: 'bg-clay-600',
  russet: 'bg-russet-600',
  sprout: 'bg-sprout-600',
};

const margin = { top: 14, right: 68, bottom: 42, left: 58 };

const defaultFormat = (y: number) => y.toLocaleString('en-US', { maximumFractionDigits: 2 });

export function LineChart({
  title,
  description,
  series,
  xLabel,
  yLabel,
  xDomain,
  formatY = defaultFormat,
  markers = [],
  guide,
  tableX,
  height = 240,
}: LineChartProps) {
  const id = useId();
  const boxRef = useRef<HTMLDivElement>(null);
  // Drawn at its real width, so its text is the page's size wherever it sits.
  const width = Math.max(280, useElementWidth(boxRef, 360));
  const yMax = Math.max(1e-9, ...series.flatMap((s) => s.points.map((p) => p.y)), guide?.y ?? 0);
  const x = scaleLinear()
    .domain(xDomain)
    .range([margin.left, width - margin.right]);
  const y = scaleLinear()
    .domain([0, yMax])
    .nice(5)
    .range([height - margin.bottom, margin.top]);
  const path = line<{ x: number; y: number }>()
    .x((p) => x(p.x))
    .y((p) => y(p.y));
  const xTicks = x
    .ticks(Math.max(2, Math.floor((width - margin.left - margin.right) / 48)))
    .filter(Number.isInteger);
  const yTicks = y.ticks(5);

  // Labels at the right-hand end of each line, nudged upwards apart so they never overlap
  // each other or drop below the axis.
  const ends = series
    .map((s) => ({ s, y: y(s.points[s.points.length - 1]?.y ?? 0) }))
    .sort((a, b) => b.y - a.y);
  for (let i = 1; i < ends.length; i++) ends[i].y = Math.min(ends[i].y, ends[i - 1].y - 15);

  return (
    <figure className="flex flex-col gap-2">
      <div ref={boxRef} className="w-full">
        <svg
          data-chart=""
          width={width}
          height={height}
          viewBox={`0 0 ${width} ${height}`}
          className="block overflow-visible"
          role="img"
          aria-labelledby={`${id}-title`}
          aria-describedby={`${id}-desc`}
        >
          <title id={`${id}-title`}>{title}</title>
          <desc id={`${id}-desc`}>{description}</desc>
          <g fontFamily="'IBM Plex Sans', sans-serif" fontSize="12">
            {yTicks.map((t) => (
              <g key={`y${t}`} transform={`translate(0 ${y(t)})`}>
                <line x1={margin.left} x2={width - margin.right} className="stroke-silt-300" />
                <text x={margin.left - 8} dy="0.32em" textAnchor="end" className="fill-loam-700">
                  {formatY(t)}
                </text>
              </g>
            ))}
            {xTicks.map((t) => (
              <g key={`x${t}`} transform={`translate(${x(t)} 0)`}>
                <line
                  y1={height - margin.bottom}
                  y2={height - margin.bottom + 5}
                  className="stroke-loam-500"
                />
                <text y={height - margin.bottom + 18} textAnchor="middle" className="fill-loam-700">
                  {t}
                </text>
              </g>
            ))}
            <line
              x1={margin.left}
              x2={width - margin.right}
              y1={height - margin.bottom}
              y2={height - margin.bottom}
              className="stroke-loam-500"
            />
            <text
              x={(margin.left + width - margin.right) / 2}
              y={height - 6}
              textAnchor="middle"
              className="fill-humus-900"
            >
              {xLabel}
            </text>
            <text
              transform={`translate(14 ${(margin.top + height - margin.bottom) / 2}) rotate(-90)`}
              textAnchor="middle"
              className="fill-humus-900"
            >
              {yLabel}
            </text>
            {guide ? (
              <g>
                <line
                  x1={margin.left}
                  x2={width - margin.right}
                  y1={y(guide.y)}
                  y2={y(guide.y)}
                  className="stroke-loam-400"
                  strokeDasharray="2 4"
                />
                <text x={margin.left + 6} y={y(guide.y) - 5} className="fill-loam-700" fontSize="11">
                  {guide.label}
                </text>
              </g>
            ) : null}
            {markers.map((m) =>
              m.x >= xDomain[0] && m.x <= xDomain[1] ? (
                <g key={m.label}>
                  <line
                    x1={x(m.x)}
                    x2={x(m.x)}
                    y1={margin.top}
                    y2={height - margin.bottom}
                    className={strokes[m.tone]}
                    strokeDasharray="4 3"
                    strokeOpacity="0.7"
                  />
                </g>
              ) : null,
            )}
            {series.map((s) => (
              <path
                key={s.id}
                d={path(s.points as { x: number; y: number }[]) ?? ''}
                fill="none"
                className={strokes[s.tone]}
                strokeWidth={s.dashed ? 2 : 2.75}
                strokeDasharray={s.dashed ? '6 4' : undefined}
                strokeLinejoin="round"
              />
            ))}
            {ends.map(({ s, y: labelY }) => (
              <text
                key={s.id}
                x={width - margin.right + 8}
                y={labelY}
                dy="0.32em"
                className={fills[s.tone]}
                fontWeight="600"
              >
                {s.label}
              </text>
            ))}
          </g>
        </svg>
      </div>
      {markers.length > 0 ? (
        <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-loam-700">
          {markers.map((m) => (
            <span key={m.label} className="inline-flex items-center gap-1.5">
              <span className={`inline-block h-3 w-0.5 ${swatches[m.tone]}`} aria-hidden="true" />
              {m.label}
            </span>
          ))}
        </figcaption>
      ) : null}
      <table className="sr-only">
        <caption>{title}</caption>
        <thead>
          <tr>
            <th scope="col">{xLabel}</th>
            {series.map((s) => (
              <th key={s.id} scope="col">
                {s.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {tableX.map((tx) => (
            <tr key={tx}>
              <th scope="row">{tx}</th>
              {series.map((s) => {
                const point = s.points.find((p) => p.x === tx);
                return <td key={s.id}>{point ? formatY(point.y) : '—'}</td>;
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}
