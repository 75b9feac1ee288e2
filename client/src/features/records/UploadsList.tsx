import { useState } from 'react';
import type { UploadView } from '../../../../shared/api/records';
import { Button } from '../../shared/components/Button';
import { originalUrl, useRemoveUpload } from './api';
import { bytesText, dateTime, kindTitle } from './format';

const th = 'px-3 py-2 text-left align-bottom font-semibold';
const td = 'px-3 py-2 align-top';

/** The field's uploads, newest first: each original can be downloaded; editors can remove one. */
export function UploadsList({
  uploads,
  workspaceId,
  fieldId,
  editable,
}: {
  uploads: readonly UploadView[];
  workspaceId: string;
  fieldId: string;
  editable: boolean;
}) {
  const remove = useRemoveUpload(workspaceId, fieldId);
  const [confirming, setConfirming] = useState<string | null>(null);
  if (uploads.length === 0) {
    return <p className="text-loam-700">No records uploaded for this field yet.</p>;
  }
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Uploads, scrolls sideways">
      <table className="w-full min-w-[48rem] border-collapse text-sm">
        <caption className="sr-only">Uploaded record files of this field, newest first</caption>
        <thead>
          <tr className="border-b-2 border-humus-900">
            <th scope="col" className={`${th} pl-0`}>
              Original file
            </th>
            <th scope="col" className={th}>
              Kind
            </th>
            <th scope="col" className={`${th} text-right`}>
              Rows
            </th>
            <th scope="col" className={th}>
              SHA-256
            </th>
            <th scope="col" className={th}>
              Uploaded
            </th>
            {editable ? (
              <th scope="col" className={th}>
                <span className="sr-only">Actions</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {uploads.map((u) => (
            <tr key={u.id} id={`upload-${u.id}`} className="border-b border-silt-200">
              <th scope="row" className={`${td} pl-0 text-left font-medium`}>
                <a
                  href={originalUrl(workspaceId, fieldId, u.id)}
                  download={u.filename}
                  className="text-humus-900 underline decoration-loam-400 underline-offset-4 hover:text-russet-700"
                >
                  {u.filename}
                </a>
                <span className="block font-normal text-loam-700">{bytesText(u.bytes)}</span>
              </th>
              <td className={td}>
                {kindTitle(u.kind)}
                {u.check ? <span className="block text-loam-700">check: {u.check}</span> : null}
              </td>
              <td className={`${td} text-right tabular-nums`}>{u.rowCount.toLocaleString('en-US')}</td>
              <td className={td}>
                <code className="font-mono text-xs break-all" title={u.sha256}>
                  {u.sha256.slice(0, 16)}…
                </code>
              </td>
              <td className={td}>
                {dateTime(u.uploadedAt)}
                {u.uploadedBy ? <span className="block text-loam-700">{u.uploadedBy}</span> : null}
              </td>
              {editable ? (
                <td className={td}>
                  {confirming === u.id ? (
                    <span
                      role="group"
                      aria-label={`Confirm removing ${u.filename}`}
                      className="flex flex-wrap gap-2"
                    >
                      <Button
                        variant="danger"
                        size="sm"
                        pending={remove.isPending}
                        pendingLabel="Removing…"
                        onClick={() => remove.mutate(u.id, { onSuccess: () => setConfirming(null) })}
                      >
                        Remove “{u.filename}”
                      </Button>
                      <Button variant="quiet" size="sm" onClick={() => setConfirming(null)}>
                        Keep it
                      </Button>
                    </span>
                  ) : (
                    <Button variant="quiet" size="sm" onClick={() => setConfirming(u.id)}>
                      Remove
                    </Button>
                  )}
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
      {remove.error ? (
        <p role="alert" className="mt-2 text-sm font-medium text-danger-700">
          {remove.error.message}
        </p>
      ) : null}
    </div>
  );
}
