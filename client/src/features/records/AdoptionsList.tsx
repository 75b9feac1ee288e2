import { Link } from 'react-router-dom';
import type { AdoptionView } from '../../../../shared/api/records';
import { dateTime } from './format';
import { NoteText } from './NoteText';

/** Every estimate adopted from this field's records, newest first, with its note and whether it still holds. */
export function AdoptionsList({
  adoptions,
  workspaceId,
}: {
  adoptions: readonly AdoptionView[];
  workspaceId: string;
}) {
  if (adoptions.length === 0)
    return <p className="text-loam-700">No estimate from these records has been adopted yet.</p>;
  const link = (a: AdoptionView) =>
    a.targetKind === 'profile'
      ? `/w/${workspaceId}/profiles/${a.targetId}`
      : a.targetKind === 'step'
        ? `/w/${workspaceId}/strategies/${a.targetId}`
        : `/w/${workspaceId}/fields/${a.targetId}`;
  return (
    <ol className="flex flex-col gap-3">
      {adoptions.map((a) => (
        <li key={a.id} className="flex flex-col gap-1 border-b border-silt-200 pb-3">
          <p className="font-medium">
            {a.estimateLabel} →{' '}
            <Link
              to={link(a)}
              className="text-humus-900 underline decoration-loam-400 underline-offset-4 hover:text-russet-700"
            >
              {a.targetName}
            </Link>
            : {a.pathLabel}
            <span
              className={`ml-2 rounded-full px-2 py-0.5 text-xs font-semibold ${a.current ? 'bg-sprout-100 text-sprout-800' : 'bg-silt-200 text-loam-700'}`}
            >
              {a.current ? 'in use' : 'superseded: changed since'}
            </span>
          </p>
          <p className="text-sm break-words">
            <NoteText note={a.note} />
          </p>
          <p className="text-xs text-loam-700">
            {dateTime(a.adoptedAt)}
            {a.adoptedBy ? ` · ${a.adoptedBy}` : ''}
          </p>
        </li>
      ))}
    </ol>
  );
}
