import { axisBottom, axisLeft } from 'd3-axis';
import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3-scale';
import { select } from 'd3-selection';
import { area, curveMonotoneX, curveStepAfter, line } from 'd3-shape';
import { useId, useLayoutEffect, useMemo, useRef, useState, type PointerEvent } from 'react';
import { LineSwatch, Marker } from './marks';
import { chartInk, type SeriesStyle } from './palette';
import { useElementWidth } from './useElementWidth';

/*
 * A quantile-band chart: for each series a median line with its 25–75 % band (darker) and
 * 5–95 % band (lighter) behind it, over years on the x axis. Scales, paths and axes come
 * from the d3 modules (not the whole d3 bundle); React owns the elements, d3-axis draws
 * the ticks into two groups. The legend is part of the drawing so an exported chart
 * keeps it. The text alternative is the summary passed in, and the page's year table
 * carries every number.
 */

export type Band = { low: readonly number[]; high: readonly number[] };

export type ChartSeries = {
  id: string;
  label: string;
  style: SeriesStyle;
  /** The line: a median, a mean-field value, or a probability; null leaves a gap. */
  values: readonly (number | null)[];
  /** 25–75 % across replicates. */
  inner?: Band;
  /** 5–95 % across replicates. */
  outer?: Band;
};

export type BandChartProps = {
  /** Names the chart for assistive technology. */
  title: string;
  /** What the chart shows, in a sentence or two: read out in place of the drawing. */
  summary: string;
  x: readonly number[];
  series: readonly ChartSeries[];
  /** Axis title with its unit, e.g. "Seeds per m²". */
  yLabel: string;
  xLabel?: string;
  /** Values in the hover readout. */
  formatValue: (value: number) => string;
  /** Tick labels; a compact number by default. */
  formatTick?: (value: number) => string;
  scale?: 'linear' | 'log';
  /** Fixed y range (probabilities: [0, 1]); otherwise from the data, from 0. */
  yDomain?: [number, number];
  /** Steps for quantities that hold for a whole year (probabilities). */
  curve?: 'smooth' | 'step';
  height?: number;
  /** How the band shading is named in the legend; omit a band's entry to leave it out. */
  bandLegend?: { inner?: string; outer?: string };
};

const compact = new Intl.NumberFormat('en-US', { notation: 'compact', maximumFractionDigits: 1 });

/**
 * Tick labels when the caller gives none: compact from 10,000 up (20K, 1.5M), otherwise
 * as many decimals as the tick step needs (0.02, 0.04 rather than 0, 0).
 */
function defaultTickFormat(ticks: readonly number[]): (value: number) => string {
  const largest = Math.max(...ticks.map(Math.abs), 0);
  if (largest >= 10_000) return (v) => compact.format(v);
  const steps = ticks
    .slice(1)
    .map((t, i) => Math.abs(t - ticks[i]))
    .filter((d) => d > 0);
  const step = steps.length ? Math.min(...steps, ...ticks.filter((t) => t > 0)) : 1;
  const decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(step) + 1e-9)));
  const format = new Intl.NumberFormat('en-US', { maximumFractionDigits: decimals });
  return (v) => format.format(v);
}

const LEGEND_ROW = 20;
const LEGEND_SWATCH = 30;
/** Plex Sans at 12 px averages a little over half an em per character. */
const approxTextWidth = (text: string) => text.length * 6.7;

type LegendItem = { key: string; label: string } & (
  { kind: 'line'; style: SeriesStyle } | { kind: 'band'; opacity: number }
);

function layoutLegend(items: LegendItem[], width: number) {
  const placed: (LegendItem & { x: number; row: number })[] = [];
  let x = 0;
  let row = 0;
  for (const item of items) {
    const w = LEGEND_SWATCH + 8 + approxTextWidth(item.label) + 18;
    if (x > 0 && x + w > width) {
      x = 0;
      row++;
    }
    placed.push({ ...item, x, row });
    x += w;
  }
  return { placed, rows: items.length === 0 ? 0 : row + 1 };
}

function extent(series: readonly ChartSeries[], positiveOnly: boolean): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  const take = (v: number | null) => {
    if (v === null || !Number.isFinite(v) || (positiveOnly && v <= 0)) return;
    low = Math.min(low, v);
    high = Math.max(high, v);
  };
  for (const s of series) {
    s.values.forEach(take);
    s.outer?.high.forEach(take);
    s.outer?.low.forEach(take);
    s.inner?.high.forEach(take);
    s.inner?.low.forEach(take);
  }
  if (!Number.isFinite(low)) return positiveOnly ? [1, 10] : [0, 1];
  return [low, high];
}

export function BandChart({
  title,
  summary,
  x,
  series,
  yLabel,
  xLabel = 'Year',
  formatValue,
  formatTick,
  scale = 'linear',
  yDomain,
  curve = 'smooth',
  height = 280,
  bandLegend,
}: BandChartProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const width = useElementWidth(containerRef);
  const xAxisRef = useRef<SVGGElement>(null);
  const yAxisRef = useRef<SVGGElement>(null);
  const titleId = useId();
  const descId = useId();
  const [hover, setHover] = useState<number | null>(null);

  const legendItems = useMemo(() => {
    const items: LegendItem[] = series.map((s) => ({
      key: s.id,
      label: s.label,
      kind: 'line',
      style: s.style,
    }));
    if (bandLegend?.inner && series.some((s) => s.inner))
      items.push({ key: 'band-inner', label: bandLegend.inner, kind: 'band', opacity: 0.32 });
    if (bandLegend?.outer && series.some((s) => s.outer))
      items.push({ key: 'band-outer', label: bandLegend.outer, kind: 'band', opacity: 0.14 });
    return items;
  }, [series, bandLegend]);

  const geometry = useMemo(() => {
    const [lowData, highData] = extent(series, scale === 'log');
    let y: ScaleContinuousNumeric<number, number>;
    let ticks: number[];
    if (scale === 'log') {
      const low = Math.max(lowData / 1.3, 1e-3);
      const high = Math.max(highData * 1.3, low * 10);
      y = scaleLog().domain([low, high]).clamp(true);
      const all = y.ticks();
      // Keep 1, 2, 5 × 10^k when the range is short, powers of ten alone when it is long.
      const decades = Math.log10(y.domain()[1] / y.domain()[0]);
      ticks = all.filter((t) => {
        const m = Math.round(t / 10 ** Math.floor(Math.log10(t) + 1e-9));
        return decades > 3 ? m === 1 : m === 1 || m === 2 || m === 5;
      });
    } else {
      const domain: [number, number] = yDomain ?? [Math.min(0, lowData), highData > 0 ? highData * 1.05 : 1];
      y = scaleLinear().domain(domain);
      if (!yDomain) y.nice(5);
      ticks = y.ticks(5);
    }
    const tickText = formatTick ?? defaultTickFormat(ticks);
    const longest = Math.max(...ticks.map((t) => tickText(t).length), 2);
    const margin = { top: 14, right: 18, bottom: 44, left: Math.round(longest * 7.2 + 34) };
    const plotWidth = Math.max(120, width - margin.left - margin.right);
    const legend = layoutLegend(legendItems, width - 12);
    const plotHeight = height - margin.top - margin.bottom;
    y.range([plotHeight, 0]);
    const xs = scaleLinear()
      .domain([x[0] ?? 0, x[x.length - 1] ?? 1])
      .range([0, plotWidth]);
    return {
      y,
      xs,
      ticks,
      tickText,
      margin,
      plotWidth,
      plotHeight,
      legend,
      totalHeight: height + legend.rows * LEGEND_ROW + 6,
    };
  }, [series, scale, yDomain, formatTick, width, legendItems, height, x]);

  const { y, xs, ticks, tickText, margin, plotWidth, plotHeight, legend, totalHeight } = geometry;

  useLayoutEffect(() => {
    if (!xAxisRef.current || !yAxisRef.current) return;
    const xTicks = x.length <= 16 ? [...x] : xs.ticks(10).filter(Number.isInteger);
    const xAxis = axisBottom(xs)
      .tickValues(xTicks)
      .tickFormat((d) => String(d))
      .tickSizeOuter(0);
    const yAxis = axisLeft(y)
      .tickValues(ticks)
      .tickFormat((d) => tickText(Number(d)))
      .tickSize(0)
      .tickPadding(8);
    // d3-axis sets its own font attributes; removing them lets the chart's text style apply.
    select(xAxisRef.current).call(xAxis).attr('font-family', null).attr('font-size', null);
    select(yAxisRef.current)
      .call(yAxis)
      .attr('font-family', null)
      .attr('font-size', null)
      .call((g) => g.select('.domain').remove());
  }, [xs, y, ticks, x, tickText]);

  const curveFactory = curve === 'step' ? curveStepAfter : curveMonotoneX;
  const linePath = line<number | null>()
    .defined((v) => v !== null && Number.isFinite(v))
    .x((_, i) => xs(x[i]))
    .y((v) => y(v as number))
    .curve(curveFactory);
  const bandPath = (band: Band) =>
    area<number>()
      .x((_, i) => xs(x[i]))
      .y0((_, i) => y(band.low[i]))
      .y1((_, i) => y(band.high[i]))
      .curve(curveFactory)(band.low.map((_, i) => i)) ?? '';

  // Markers on every point when there are few; on every other one when years are many.
  const markerEvery = x.length > 24 ? Math.ceil(x.length / 12) : 1;

  const onPointerMove = (event: PointerEvent<SVGRectElement>) => {
    const bounds = event.currentTarget.getBoundingClientRect();
    const year = xs.invert(event.clientX - bounds.left);
    let best = 0;
    x.forEach((v, i) => {
      if (Math.abs(v - year) < Math.abs(x[best] - year)) best = i;
    });
    setHover(best);
  };

  return (
    <div ref={containerRef} className="relative w-full">
      <svg
        data-chart=""
        role="img"
        aria-labelledby={titleId}
        aria-describedby={descId}
        width={width}
        height={totalHeight}
        className="block font-sans text-xs"
        style={{ fontVariantNumeric: 'tabular-nums' }}
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{summary}</desc>
        <g transform={`translate(${margin.left} ${margin.top})`}>
          {ticks.map((t) => (
            <line key={t} x1={0} x2={plotWidth} y1={y(t)} y2={y(t)} stroke={chartInk.grid} strokeWidth={1} />
          ))}
          {series.map((s) => (
            <g key={`bands-${s.id}`}>
              {s.outer ? <path d={bandPath(s.outer)} fill={s.style.color} fillOpacity={0.14} /> : null}
              {s.inner ? <path d={bandPath(s.inner)} fill={s.style.color} fillOpacity={0.2} /> : null}
            </g>
          ))}
          {series.map((s) => (
            <g key={`line-${s.id}`}>
              <path
                d={linePath([...s.values]) ?? ''}
                fill="none"
                stroke={s.style.color}
                strokeWidth={s.style.width}
                strokeDasharray={s.style.dash ?? undefined}
                strokeLinejoin="round"
                strokeLinecap={s.style.dash === '1 4' || s.style.dash === '2 3' ? 'round' : 'butt'}
              />
              {s.values.map((v, i) =>
                v === null || !Number.isFinite(v) || i % markerEvery !== 0 ? null : (
                  <Marker key={i} style={s.style} x={xs(x[i])} y={y(v)} />
                ),
              )}
            </g>
          ))}
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
          {hover !== null ? (
            <line
              data-export="skip"
              x1={xs(x[hover])}
              x2={xs(x[hover])}
              y1={0}
              y2={plotHeight}
              stroke={chartInk.strong}
              strokeOpacity={0.5}
              strokeDasharray="3 3"
            />
          ) : null}
          <rect
            data-export="skip"
            width={plotWidth}
            height={plotHeight}
            fill="transparent"
            onPointerMove={onPointerMove}
            onPointerLeave={() => setHover(null)}
          />
        </g>
        <g transform={`translate(8 ${height + 4})`}>
          {legend.placed.map((item) => (
            <g key={item.key} transform={`translate(${item.x} ${item.row * LEGEND_ROW})`}>
              {item.kind === 'line' ? (
                <LineSwatch style={item.style} y={6} width={LEGEND_SWATCH} />
              ) : (
                <rect
                  y={0}
                  width={LEGEND_SWATCH}
                  height={12}
                  fill={chartInk.strong}
                  fillOpacity={item.opacity}
                />
              )}
              <text x={LEGEND_SWATCH + 8} y={10} fill={chartInk.strong}>
                {item.label}
              </text>
            </g>
          ))}
        </g>
      </svg>
      {hover !== null ? (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute top-2 z-10 min-w-40 rounded-seed border border-silt-300 bg-white/95 px-3 py-2 text-xs shadow-sheet"
          style={
            xs(x[hover]) + margin.left > width / 2
              ? { right: width - (xs(x[hover]) + margin.left) + 12 }
              : { left: xs(x[hover]) + margin.left + 12 }
          }
        >
          <p className="font-semibold text-humus-900">
            {xLabel} {x[hover]}
          </p>
          <ul className="mt-1 flex flex-col gap-0.5">
            {series.map((s) => {
              const v = s.values[hover];
              return (
                <li key={s.id} className="flex items-center justify-between gap-3">
                  <span className="truncate text-loam-700">{s.label}</span>
                  <span className="font-medium text-humus-900">
                    {v === null || !Number.isFinite(v) ? '—' : formatValue(v)}
                  </span>
                </li>
              );
            })}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
