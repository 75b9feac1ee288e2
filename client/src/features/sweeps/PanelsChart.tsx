import { axisBottom, axisLeft } from 'd3-axis';
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useId, useRef } from 'react';
import { chartInk } from '../../shared/charts/palette';
import { useElementWidth } from '../../shared/charts/useElementWidth';
import tokens from '../../../../tailwind.config';
import { clip, useAxis } from './chartParts';

/*
 * Small multiples, one panel per parameter, sharing the outcome axis so panels compare at a
 * glance: the scatter of the outcome against each parameter, or a factorial grid's main
 * effect (the mean outcome at each level, joined by a line).
 */

const c = tokens.theme.extend.colors;
const DOT = c.humus[800];

export type PanelData = {
  key: string;
  label: string;
  /** Parameter values as shown (converted). */
  x: readonly number[];
  /** Outcome values as shown. */
  y: readonly number[];
  xUnit: string;
};

type Props = {
  title: string;
  panels: readonly PanelData[];
  yLabel: string;
  kind: 'scatter' | 'line';
  format: (value: number) => string;
};

const PANEL_HEIGHT = 190;
const margin = { top: 24, right: 14, bottom: 42, left: 64 };

export function PanelsChart({ title, panels, yLabel, kind, format }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const width = useElementWidth(ref);
  const titleId = useId();
  const columns = width >= 900 ? 3 : width >= 560 ? 2 : 1;
  const panelWidth = Math.floor(width / columns);
  const rows = Math.ceil(panels.length / columns);
  const ys = panels.flatMap((p) => p.y);
  const low = ys.length ? Math.min(...ys) : 0;
  const high = ys.length ? Math.max(...ys) : 1;
  const pad = (high - low || Math.abs(high) || 1) * 0.06;
  const y = scaleLinear()
    .domain([low - pad, high + pad])
    .range([PANEL_HEIGHT - margin.top - margin.bottom, 0])
    .nice();
  const height = rows * PANEL_HEIGHT + 18;

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
        <text x={4} y={12} fill={chartInk.text} className="font-medium">
          {yLabel}
        </text>
        {panels.map((p, i) => (
          <Panel
            key={p.key}
            data={p}
            y={y}
            left={(i % columns) * panelWidth}
            top={18 + Math.floor(i / columns) * PANEL_HEIGHT}
            width={panelWidth}
            kind={kind}
            format={format}
          />
        ))}
      </svg>
    </div>
  );
}

function Panel({
  data,
  y,
  left,
  top,
  width,
  kind,
  format,
}: {
  data: PanelData;
  y: ScaleLinear<number, number>;
  left: number;
  top: number;
  width: number;
  kind: 'scatter' | 'line';
  format: (value: number) => string;
}) {
  const plotWidth = Math.max(60, width - margin.left - margin.right);
  const plotHeight = PANEL_HEIGHT - margin.top - margin.bottom;
  const xs = data.x.length ? data.x : [0, 1];
  // A little room at both ends so the dots at min and max are not cut by the frame.
  const span = Math.max(...xs) - Math.min(...xs) || Math.abs(xs[0]) || 1;
  const x = scaleLinear()
    .domain([Math.min(...xs) - span * 0.04, Math.max(...xs) + span * 0.04])
    .range([0, plotWidth])
    .nice();
  const xAxis = useAxis(axisBottom(x).ticks(Math.max(2, Math.floor(plotWidth / 70))));
  const yAxis = useAxis(
    axisLeft(y)
      .ticks(4)
      .tickFormat((d) => format(Number(d))),
    false,
  );
  const path =
    kind === 'line'
      ? line<number>()
          .x((_, i) => x(data.x[i]))
          .y((v) => y(v))(data.y as number[])
      : null;
  return (
    <g transform={`translate(${left + margin.left} ${top + margin.top})`}>
      <text x={0} y={-8} fill={chartInk.strong} className="font-medium">
        <title>{data.label}</title>
        {clip(data.label, Math.floor(plotWidth / 6.4))}
      </text>
      <rect width={plotWidth} height={plotHeight} fill="none" stroke={chartInk.grid} />
      {kind === 'scatter' ? (
        data.x.map((v, i) => (
          <circle key={i} cx={x(v)} cy={y(data.y[i])} r={2.4} fill={DOT} fillOpacity={0.6} />
        ))
      ) : (
        <>
          <path d={path ?? ''} fill="none" stroke={DOT} strokeWidth={2} />
          {data.x.map((v, i) => (
            <circle key={i} cx={x(v)} cy={y(data.y[i])} r={3.5} fill={DOT} />
          ))}
        </>
      )}
      <g ref={xAxis} transform={`translate(0 ${plotHeight})`} color={chartInk.text} />
      <g ref={yAxis} color={chartInk.text} />
      <text x={plotWidth / 2} y={plotHeight + 34} textAnchor="middle" fill={chartInk.text}>
        {data.xUnit}
      </text>
    </g>
  );
}
