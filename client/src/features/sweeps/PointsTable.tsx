import { useState } from 'react';
import type { SweepView } from '../../../../shared/api/sweeps';
import { outcomeInfo } from '../../../../shared/sweeps/outcomes';
import { Button } from '../../shared/components/Button';
import { ChartOption } from '../../shared/charts/ChartOption';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useUnits } from '../../shared/lib/units';
import { useSweepPoints, type PointsQuery } from './api';
import { formatNumber, grouped, outcomeTitle, unitShown } from './display';

const PAGE_SIZES = [25, 50, 100];

/**
 * The finished points, a page at a time, sorted by the server by any column: parameters in
 * the chosen unit system, outcomes, and the error of a point that failed.
 */
export function PointsTable({ sweep, workspaceId }: { sweep: SweepView; workspaceId: string }) {
  const { system } = useUnits();
  const [query, setQuery] = useState<PointsQuery>({
    page: 1,
    pageSize: 25,
    sort: 'index',
    order: 'asc',
    filter: 'all',
  });
  const points = useSweepPoints(workspaceId, sweep.id, query, sweep.pointsDone);
  const pages = Math.max(1, Math.ceil((points.data?.total ?? 0) / query.pageSize));

  const columns = [
    { key: 'index', label: 'Point' },
    ...sweep.parameters.map((p, j) => ({ key: `p${j}`, label: `${p.label} (${unitShown(p.unit, system)})` })),
    ...sweep.outcomes.map((k) => ({ key: k, label: outcomeTitle(k, sweep.outcomeYear, system) })),
  ];
  const sortBy = (key: string) =>
    setQuery((q) => ({
      ...q,
      page: 1,
      sort: key,
      order: q.sort === key && q.order === 'asc' ? 'desc' : 'asc',
    }));

  return (
    <section aria-labelledby="sweep-points" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="sweep-points" className="text-2xl font-semibold">
          Points
        </h2>
        <div className="flex flex-wrap items-center gap-3">
          <ChartOption
            legend="Which points to list"
            label="Show"
            value={query.filter}
            options={[
              { value: 'all', label: 'All' },
              { value: 'failed', label: `Failed (${grouped(sweep.failedPoints)})` },
            ]}
            onChange={(filter) => setQuery((q) => ({ ...q, page: 1, filter }))}
          />
          <label className="flex items-center gap-2 text-sm text-loam-700">
            Per page
            <select
              value={query.pageSize}
              onChange={(e) => setQuery((q) => ({ ...q, page: 1, pageSize: Number(e.target.value) }))}
              className="min-h-9 rounded-seed border border-loam-400 bg-white px-2 text-sm text-humus-900"
            >
              {PAGE_SIZES.map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </label>
        </div>
      </div>
      {points.isPending ? (
        <LoadingNotice>Loading the points…</LoadingNotice>
      ) : points.isError ? (
        <ErrorNotice
          title="The points could not be loaded"
          error={points.error}
          onRetry={() => void points.refetch()}
        />
      ) : (
        <>
          <div className="overflow-x-auto rounded-seed border border-silt-300 bg-white">
            <table className="w-full border-collapse text-left text-sm tabular-nums">
              <caption className="sr-only">
                Points of {sweep.name}, sorted by {columns.find((c) => c.key === query.sort)?.label},{' '}
                {query.order === 'asc' ? 'ascending' : 'descending'}
              </caption>
              <thead className="bg-silt-100">
                <tr>
                  {columns.map((c) => (
                    <th
                      key={c.key}
                      scope="col"
                      aria-sort={
                        query.sort === c.key
                          ? query.order === 'asc'
                            ? 'ascending'
                            : 'descending'
                          : undefined
                      }
                      className="border-b border-silt-300 px-3 py-2 align-bottom font-semibold"
                    >
                      <button
                        type="button"
                        onClick={() => sortBy(c.key)}
                        className="flex items-end gap-1 text-left hover:text-russet-700"
                      >
                        <span>{c.label}</span>
                        <span aria-hidden="true" className="text-xs">
                          {query.sort === c.key ? (query.order === 'asc' ? '▲' : '▼') : '↕'}
                        </span>
                      </button>
                    </th>
                  ))}
                  {query.filter === 'failed' || sweep.failedPoints > 0 ? (
                    <th scope="col" className="border-b border-silt-300 px-3 py-2 align-bottom font-semibold">
                      Error
                    </th>
                  ) : null}
                </tr>
              </thead>
              <tbody>
                {points.data.points.map((p) => (
                  <tr key={p.index} className="odd:bg-silt-50">
                    <th scope="row" className="px-3 py-1.5 font-normal">
                      {p.index}
                    </th>
                    {sweep.parameters.map((q, j) => (
                      <td key={q.path} className="px-3 py-1.5">
                        {formatNumber(p.inputs[j], q.unit, system)}
                      </td>
                    ))}
                    {sweep.outcomes.map((k) => {
                      const v = p.outcomes?.[k];
                      return (
                        <td key={k} className="px-3 py-1.5">
                          {v === undefined ? '—' : formatNumber(v, outcomeInfo[k].unit, system)}
                        </td>
                      );
                    })}
                    {query.filter === 'failed' || sweep.failedPoints > 0 ? (
                      <td className="px-3 py-1.5 text-danger-700">{p.error ?? ''}</td>
                    ) : null}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <nav aria-label="Pages of points" className="flex flex-wrap items-center gap-3 text-sm">
            <Button
              variant="secondary"
              size="sm"
              disabled={query.page <= 1}
              onClick={() => setQuery((q) => ({ ...q, page: q.page - 1 }))}
            >
              Previous
            </Button>
            <span>
              Page {query.page} of {pages} · {grouped(points.data.total)} points
            </span>
            <Button
              variant="secondary"
              size="sm"
              disabled={query.page >= pages}
              onClick={() => setQuery((q) => ({ ...q, page: q.page + 1 }))}
            >
              Next
            </Button>
          </nav>
        </>
      )}
    </section>
  );
}
