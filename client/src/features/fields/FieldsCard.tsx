import { Link } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { conversion, formatNumber } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { useFields } from './api';

/**
 * The workspace's fields in a dashboard card: each links to its editor, with its crop,
 * area and starting seedbank. For the dashboard composed in client/src/app/.
 */
export function FieldsCard() {
  const workspace = useCurrentWorkspace();
  const fields = useFields(workspace.id);
  const { system } = useUnits();
  const area = conversion('ha', system);
  const density = conversion('seeds/m²', system);
  const canEdit = workspace.role !== 'viewer';

  return (
    <section
      aria-labelledby="fields-card-title"
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="fields-card-title" className="text-2xl font-semibold">
          <Link to={`/w/${workspace.id}/fields`} className="underline-offset-4 hover:underline">
            Fields
          </Link>
        </h2>
        {canEdit ? (
          <Link
            to={`/w/${workspace.id}/fields/new`}
            className="text-sm font-medium text-russet-700 underline underline-offset-4"
          >
            New field
          </Link>
        ) : null}
      </div>
      {fields.isPending ? (
        <LoadingNotice>Loading fields…</LoadingNotice>
      ) : fields.isError ? (
        <ErrorNotice
          title="Fields could not be loaded"
          error={fields.error}
          onRetry={() => void fields.refetch()}
        />
      ) : fields.data.length === 0 ? (
        <p className="text-loam-700">
          {canEdit ? 'No fields yet: add one with its soil-core counts.' : 'No fields yet.'}
        </p>
      ) : (
        <ul className="flex flex-col divide-y divide-silt-200">
          {fields.data.map((f) => (
            <li key={f.id} className="py-2">
              <Link
                to={`/w/${workspace.id}/fields/${f.id}`}
                className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
              >
                {f.name}
              </Link>
              <p className="text-sm text-loam-700">
                {f.crop} · {formatNumber(area.toShown(f.setting.areaHa), 2)} {area.unit} · seedbank{' '}
                {formatNumber(
                  density.toShown(f.setting.initialSeedbank.shallow + f.setting.initialSeedbank.deep),
                  1,
                )}{' '}
                {density.unit}
              </p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
