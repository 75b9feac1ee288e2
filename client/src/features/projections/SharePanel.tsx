import { useId } from 'react';
import { buttonClasses, Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useUnits } from '../../shared/lib/units';
import { useSetShare, useShareAudience, useShares } from './api';

/**
 * Hand the comparison to a grower: share it with the workspace's viewers (a viewer sees
 * only what is shared), print it, or download the grower report as PDF.
 */
export function SharePanel({ batchId, finished }: { batchId: string; finished: boolean }) {
  const workspace = useCurrentWorkspace();
  const { system } = useUnits();
  const canShare = workspace.role !== 'viewer';
  const audience = useShareAudience(workspace.id, canShare);
  const shares = useShares(workspace.id, batchId, canShare);
  const setShare = useSetShare(workspace.id, batchId);
  const titleId = useId();
  const shared = new Set((shares.data ?? []).map((s) => s.userId));
  const reportHref = `/api/workspaces/${encodeURIComponent(workspace.id)}/batches/${encodeURIComponent(batchId)}/report.pdf?units=${system === 'us' ? 'us' : 'metric'}`;

  return (
    <section
      aria-labelledby={titleId}
      className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet print:hidden"
    >
      <h2 id={titleId} className="text-2xl font-semibold">
        Hand it to the grower
      </h2>
      <div className="flex flex-wrap gap-3">
        {finished ? (
          <a href={reportHref} download className={buttonClasses('primary', 'sm')}>
            Download the grower report (PDF)
          </a>
        ) : (
          <p className="text-sm text-loam-700">The report is ready once every projection has finished.</p>
        )}
        <Button variant="secondary" size="sm" onClick={() => window.print()}>
          Print this page
        </Button>
      </div>
      {canShare ? (
        <div className="flex flex-col gap-2">
          <h3 className="font-semibold">Shared with</h3>
          {audience.data && audience.data.length === 0 ? (
            <p className="text-sm text-loam-700">
              This workspace has no viewers yet. Invite a grower as a viewer on the Members page; a viewer
              sees only the comparisons shared with them.
            </p>
          ) : null}
          <ul className="flex flex-col gap-1">
            {(audience.data ?? []).map((m) => (
              <li key={m.user.id}>
                <label className="inline-flex items-center gap-2">
                  <input
                    type="checkbox"
                    className="size-4 accent-sprout-700"
                    checked={shared.has(m.user.id)}
                    disabled={setShare.isPending || shares.isPending}
                    onChange={(e) => setShare.mutate({ userId: m.user.id, shared: e.target.checked })}
                  />
                  <span>
                    {m.user.name} <span className="text-sm text-loam-700">({m.user.email})</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          <FormAlert error={setShare.error} />
        </div>
      ) : null}
    </section>
  );
}
