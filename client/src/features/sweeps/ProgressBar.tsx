import type { SweepView } from '../../../../shared/api/sweeps';
import { grouped, statusNames } from './display';

const fill: Record<SweepView['status'], string> = {
  queued: 'bg-loam-400',
  running: 'bg-humus-900',
  paused: 'bg-clay-600',
  done: 'bg-sprout-700',
  failed: 'bg-danger-700',
  cancelled: 'bg-loam-500',
};

/**
 * Points done of the total as a bar a screen reader reads as a progress bar. The numbers
 * come from the server, so the bar stands where the sweep stands after a reload.
 */
export function ProgressBar({
  sweep,
  label,
  compact = false,
}: {
  sweep: SweepView;
  label: string;
  compact?: boolean;
}) {
  const share = sweep.totalPoints > 0 ? sweep.pointsDone / sweep.totalPoints : 0;
  return (
    <div className="flex flex-col gap-1.5">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={sweep.totalPoints}
        aria-valuenow={sweep.pointsDone}
        aria-valuetext={`${grouped(sweep.pointsDone)} of ${grouped(sweep.totalPoints)} points, ${statusNames[sweep.status].toLowerCase()}`}
        className={`overflow-hidden rounded-full border border-silt-300 bg-silt-100 ${compact ? 'h-2.5' : 'h-4'}`}
      >
        <div
          className={`h-full ${fill[sweep.status]} transition-[width] duration-500`}
          style={{ width: `${(share * 100).toFixed(2)}%` }}
        />
      </div>
      <p className={`text-loam-700 ${compact ? 'text-xs' : 'text-sm'}`}>
        <span className="font-medium text-humus-900">
          {grouped(sweep.pointsDone)} of {grouped(sweep.totalPoints)} points
        </span>{' '}
        ({Math.floor(share * 100)} %)
        {sweep.failedPoints > 0 ? `, ${grouped(sweep.failedPoints)} failed` : ''}
      </p>
    </div>
  );
}
