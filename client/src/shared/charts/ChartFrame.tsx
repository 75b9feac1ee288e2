import { useId, useRef, useState, type ReactNode } from 'react';
import { Button } from '../components/Button';
import { downloadChartPng, downloadChartSvg } from '../lib/chartExport';
import { fileSlug } from '../lib/download';

type ChartFrameProps = {
  title: string;
  /** Written under the title in exported files: scenario, seed, units. */
  exportSubtitle?: string;
  /** File name stem for exports; from the title when absent. */
  filename?: string;
  /** A line under the heading saying how to read the chart. */
  lead?: ReactNode;
  /** Options drawn beside the export buttons (scale, bands). */
  controls?: ReactNode;
  children: ReactNode;
  headingLevel?: 'h2' | 'h3';
  className?: string;
};

/**
 * A chart on the page: its heading, how to read it, and PNG/SVG export of the drawing
 * below. The export reads the one <svg data-chart> inside, so any chart fits.
 */
export function ChartFrame({
  title,
  exportSubtitle,
  filename,
  lead,
  controls,
  children,
  headingLevel: Heading = 'h3',
  className = '',
}: ChartFrameProps) {
  const frameRef = useRef<HTMLElement>(null);
  const headingId = useId();
  const [busy, setBusy] = useState<'png' | 'svg' | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  const exportAs = async (kind: 'png' | 'svg') => {
    const svg = frameRef.current?.querySelector<SVGSVGElement>('svg[data-chart]');
    if (!svg) return;
    setBusy(kind);
    setFailure(null);
    const options = { title, subtitle: exportSubtitle, filename: filename ?? fileSlug(title) };
    try {
      await (kind === 'png' ? downloadChartPng(svg, options) : downloadChartSvg(svg, options));
    } catch (error) {
      setFailure(error instanceof Error ? error.message : 'The chart could not be exported.');
    } finally {
      setBusy(null);
    }
  };

  return (
    <figure
      ref={frameRef}
      aria-labelledby={headingId}
      className={`flex min-w-0 flex-col gap-3 rounded-seed border border-silt-300 bg-white p-4 shadow-sheet break-inside-avoid sm:p-5 ${className}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
        <div className="min-w-0 flex-1">
          <Heading id={headingId} className="text-xl font-semibold">
            {title}
          </Heading>
          {lead ? <div className="mt-1 max-w-prose text-sm text-loam-700">{lead}</div> : null}
        </div>
        <div className="flex flex-wrap items-center gap-2 print:hidden">
          {controls}
          <Button
            variant="secondary"
            size="sm"
            pending={busy === 'png'}
            onClick={() => void exportAs('png')}
            aria-label={`Export “${title}” as PNG`}
          >
            PNG
          </Button>
          <Button
            variant="secondary"
            size="sm"
            pending={busy === 'svg'}
            onClick={() => void exportAs('svg')}
            aria-label={`Export “${title}” as SVG`}
          >
            SVG
          </Button>
        </div>
      </div>
      {children}
      {failure ? (
        <p role="alert" className="text-sm font-medium text-danger-700">
          {failure}
        </p>
      ) : null}
    </figure>
  );
}
