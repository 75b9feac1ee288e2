import { Link } from 'react-router-dom';
import { buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { conversion, formatNumber } from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { useFields } from './api';

/** The workspace's fields as a table: name, crop, planting year, area, seedbank and plants, in the chosen units. */
export function FieldsPage() {
  const workspace = useCurrentWorkspace();
  const fields = useFields(workspace.id);
  const { system } = useUnits();
  const area = conversion('ha', system);
  const density = conversion('seeds/m²', system);
  const plants = conversion('plants/m²', system);
  const canEdit = workspace.role !== 'viewer';

  return (
    <div className="flex flex-col gap-8">
      <title>{`Fields · ${workspace.name} · Seedwake`}</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow={workspace.name}
          title="Fields"
          lead="Each field holds its area, crop, the seedbank and plants found at the first census, and what the crop is worth."
        />
        {canEdit ? (
          <Link to={`/w/${workspace.id}/fields/new`} className={buttonClasses('primary')}>
            New field
          </Link>
        ) : null}
      </div>
      {fields.isPending ? (
        <LoadingNotice>Loading fields…</LoadingNotice>
      ) : fields.isError ? (
        <ErrorNotice
          title="Seedwake could not load the fields"
          error={fields.error}
          onRetry={() => void fields.refetch()}
        />
      ) : fields.data.length === 0 ? (
        <p className="rounded-seed border border-dashed border-loam-400 bg-silt-50 p-5 text-loam-700">
          {canEdit
            ? 'No fields yet. Add one with its soil-core counts; they set the starting seedbank.'
            : 'No fields yet. Fields the editors add appear here.'}
        </p>
      ) : (
        <div className="overflow-x-auto rounded-seed border border-silt-300 bg-white shadow-sheet">
          <table className="w-full text-left">
            <caption className="sr-only">Fields of {workspace.name}</caption>
            <thead className="bg-silt-100 text-sm text-loam-700">
              <tr>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Field
                </th>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Crop
                </th>
                <th scope="col" className="px-4 py-3 text-right font-semibold">
                  Area ({area.unit})
                </th>
                <th scope="col" className="px-4 py-3 text-right font-semibold">
                  Seedbank, shallow · deep ({density.unit})
                </th>
                <th scope="col" className="px-4 py-3 text-right font-semibold">
                  Plants ({plants.unit})
                </th>
              </tr>
            </thead>
            <tbody>
              {fields.data.map((f) => (
                <tr key={f.id} className="border-t border-silt-200">
                  <th scope="row" className="px-4 py-3 font-medium">
                    <Link
                      to={`/w/${workspace.id}/fields/${f.id}`}
                      className="text-russet-700 underline underline-offset-4 hover:text-russet-800"
                    >
                      {f.name}
                    </Link>
                  </th>
                  <td className="px-4 py-3">
                    {f.crop}
                    {f.plantingYear ? (
                      <span className="text-loam-700">, planted {f.plantingYear}</span>
                    ) : null}
                  </td>
                  <td className="px-4 py-3 text-right">{formatNumber(area.toShown(f.setting.areaHa), 2)}</td>
                  <td className="px-4 py-3 text-right">
                    {formatNumber(density.toShown(f.setting.initialSeedbank.shallow), 1)} ·{' '}
                    {formatNumber(density.toShown(f.setting.initialSeedbank.deep), 1)}
                  </td>
                  <td className="px-4 py-3 text-right">
                    {formatNumber(plants.toShown(f.setting.initialPlants), 2)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
