import { select } from 'd3-selection';
import type { Axis, AxisDomain } from 'd3-axis';
import { useLayoutEffect, useRef } from 'react';
import { chartInk } from '../../shared/charts/palette';

/*
 * Pieces every sweep chart shares. React owns the SVG elements; d3-axis draws ticks into a
 * <g> after each render, with the page's font (its own font attributes removed).
 */

export function useAxis<D extends AxisDomain>(axis: Axis<D>, keepDomain = true) {
  const ref = useRef<SVGGElement>(null);
  useLayoutEffect(() => {
    if (!ref.current) return;
    const g = select(ref.current);
    g.call(axis).attr('font-family', null).attr('font-size', null);
    if (!keepDomain) g.select('.domain').remove();
  });
  return ref;
}

/** Long labels are cut to fit the margin; the full text stays in a <title> tooltip and the table. */
export function clip(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max - 1)}…`;
}

export function AxisTitle({
  x,
  y,
  rotate = false,
  children,
}: {
  x: number;
  y: number;
  rotate?: boolean;
  children: string;
}) {
  return (
    <text
      transform={`translate(${x} ${y})${rotate ? ' rotate(-90)' : ''}`}
      textAnchor="middle"
      fill={chartInk.text}
      className="font-medium"
    >
      {children}
    </text>
  );
}

/** The numbers behind a chart, for screen readers and anyone who wants them exact. */
export function NumbersTable({
  caption,
  headers,
  rows,
}: {
  caption: string;
  headers: readonly string[];
  rows: readonly (readonly string[])[];
}) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer font-medium text-russet-700">The numbers</summary>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full border-collapse text-left tabular-nums">
          <caption className="sr-only">{caption}</caption>
          <thead>
            <tr>
              {headers.map((h) => (
                <th key={h} scope="col" className="border-b border-silt-300 px-2 py-1 font-semibold">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i} className="odd:bg-silt-50">
                {r.map((cell, j) =>
                  j === 0 ? (
                    <th key={j} scope="row" className="px-2 py-1 font-normal">
                      {cell}
                    </th>
                  ) : (
                    <td key={j} className="px-2 py-1">
                      {cell}
                    </td>
                  ),
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
