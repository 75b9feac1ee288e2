import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Adoptable, AdoptionView, AdoptTarget } from '../../../../shared/api/records';
import type { ProfileView } from '../../../../shared/api/profiles';
import type { StrategyView } from '../../../../shared/api/strategies';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import type { AdoptSlot } from './AdoptCell';
import { AdoptionsList } from './AdoptionsList';
import { AdoptPanel, type AdoptField } from './AdoptPanel';
import { useAdoptions, useEstimates, useUploads } from './api';
import { EstimatesView } from './EstimatesView';
import { UploadForm } from './UploadForm';
import { UploadsList } from './UploadsList';

type Props = {
  field: AdoptField;
  /** The workspace's species profiles and strategies, the targets an estimate can go into. */
  profiles: readonly ProfileView[];
  strategies: readonly StrategyView[];
  copyProfile: (profileId: string) => Promise<ProfileView>;
  onAdopted: (target: AdoptTarget['kind'], adoption: AdoptionView) => void;
};

function Section({ title, lead, children }: { title: string; lead?: ReactNode; children: ReactNode }) {
  return (
    <Panel className="flex flex-col gap-4">
      <div>
        <h2 className="text-2xl font-semibold">{title}</h2>
        {lead ? <div className="mt-1 max-w-prose text-sm text-loam-700">{lead}</div> : null}
      </div>
      {children}
    </Panel>
  );
}

/**
 * /w/:workspaceId/fields/:fieldId/records — a field's records: the uploads with their
 * originals, an upload form with preview (editors), the estimates with intervals and
 * charts, and adoption of each estimate into a profile, a step or the field.
 */
export function RecordsPage({ field, profiles, strategies, copyProfile, onAdopted }: Props) {
  const workspace = useCurrentWorkspace();
  const editable = workspace.role !== 'viewer';
  const uploads = useUploads(workspace.id, field.id);
  const estimates = useEstimates(workspace.id, field.id);
  const adoptions = useAdoptions(workspace.id, field.id);
  const [adopting, setAdopting] = useState<Adoptable | null>(null);

  const slot: AdoptSlot | undefined = editable
    ? {
        activeKey: adopting?.key ?? null,
        open: (estimate) => setAdopting((current) => (current?.key === estimate.key ? null : estimate)),
        panel: adopting ? (
          <AdoptPanel
            key={adopting.key}
            estimate={adopting}
            workspaceId={workspace.id}
            field={field}
            profiles={profiles}
            strategies={strategies}
            copyProfile={copyProfile}
            onAdopted={onAdopted}
            onClose={() => setAdopting(null)}
          />
        ) : null,
      }
    : undefined;

  return (
    <div className="flex flex-col gap-6">
      <title>{`Records · ${field.name} · Seedwake`}</title>
      <Link
        to={`/w/${workspace.id}/fields/${field.id}`}
        className="self-start text-sm font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800 print:hidden"
      >
        ← {field.name}
      </Link>
      <PageTitle
        eyebrow="Field records"
        title={`Records of ${field.name}`}
        lead={
          editable
            ? 'Soil cores, plant counts, germination tests and efficacy trials: upload the files, read the estimates with their intervals, and adopt them into a species profile, a strategy step or this field.'
            : 'Soil cores, plant counts, germination tests and efficacy trials of this field, with the estimates made from them. You can read them; editors in the workspace upload and adopt.'
        }
      />
      {editable ? (
        <Section
          title="Upload records"
          lead="Each file is checked row by row first; an import saves the whole file or nothing."
        >
          <UploadForm workspaceId={workspace.id} fieldId={field.id} />
        </Section>
      ) : null}
      <Section
        title="Uploads"
        lead="The original files as uploaded, byte for byte, with their SHA-256 checksums."
      >
        {uploads.isPending ? (
          <LoadingNotice>Loading the uploads…</LoadingNotice>
        ) : uploads.isError ? (
          <ErrorNotice
            title="The uploads could not be loaded"
            error={uploads.error}
            onRetry={() => void uploads.refetch()}
          />
        ) : (
          <UploadsList
            uploads={uploads.data}
            workspaceId={workspace.id}
            fieldId={field.id}
            editable={editable}
          />
        )}
      </Section>
      <Section
        title="Estimates"
        lead="Every interval is 95 %. Densities follow the units switch at the top of the page."
      >
        {estimates.isPending ? (
          <LoadingNotice>Working out the estimates…</LoadingNotice>
        ) : estimates.isError ? (
          <ErrorNotice
            title="The estimates could not be loaded"
            error={estimates.error}
            onRetry={() => void estimates.refetch()}
          />
        ) : (
          <EstimatesView estimates={estimates.data} adopt={slot} />
        )}
      </Section>
      <Section title="Adopted from these records">
        {adoptions.isPending ? (
          <LoadingNotice>Loading…</LoadingNotice>
        ) : adoptions.isError ? (
          <ErrorNotice
            title="The adoptions could not be loaded"
            error={adoptions.error}
            onRetry={() => void adoptions.refetch()}
          />
        ) : (
          <AdoptionsList adoptions={adoptions.data} workspaceId={workspace.id} />
        )}
      </Section>
    </div>
  );
}
