import { useNavigate, useParams } from 'react-router-dom';
import { BackLink } from '../../shared/components/BackLink';
import { ConfirmDelete } from '../../shared/components/ConfirmDelete';
import { LoadFailure } from '../../shared/components/LoadFailure';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useCreateStrategy, useDeleteStrategy, useStrategy, useUpdateStrategy } from './api';
import { StrategyBuilder, type FieldOption } from './StrategyBuilder';

/** /w/:workspaceId/strategies/new. `fields` come from the fields feature, composed in the app. */
export function NewStrategyPage({ fields }: { fields: readonly FieldOption[] }) {
  const workspace = useCurrentWorkspace();
  const create = useCreateStrategy(workspace.id);
  const navigate = useNavigate();
  if (workspace.role === 'viewer') return <NotFoundNotice what="page" />;
  return (
    <div className="flex flex-col gap-6">
      <title>New strategy · Seedwake</title>
      <BackLink to={`/w/${workspace.id}/strategies`}>← All strategies</BackLink>
      <PageTitle
        eyebrow="Strategy"
        title="New strategy"
        lead="Name it, add its steps season by season, and save. A strategy without steps is the same as doing nothing."
      />
      <StrategyBuilder
        view={null}
        fields={fields}
        editable
        saving={create.isPending}
        saveError={create.error}
        onSave={(body) =>
          create.mutateAsync(body).then((saved) => {
            void navigate(`/w/${workspace.id}/strategies/${saved.id}`, { replace: true });
            return saved;
          })
        }
      />
    </div>
  );
}

/** /w/:workspaceId/strategies/:strategyId — the builder; read-only for viewers. */
export function StrategyPage({ fields }: { fields: readonly FieldOption[] }) {
  const { strategyId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  const query = useStrategy(workspace.id, strategyId);
  const update = useUpdateStrategy(workspace.id, strategyId);
  const remove = useDeleteStrategy(workspace.id);
  const navigate = useNavigate();

  if (query.isPending) return <LoadingNotice>Loading the strategy…</LoadingNotice>;
  if (query.isError)
    return <LoadFailure error={query.error} what="strategy" onRetry={() => void query.refetch()} />;
  const view = query.data;
  const editable = workspace.role !== 'viewer';
  const field = fields.find((f) => f.id === view.fieldId);

  return (
    <div className="flex flex-col gap-6">
      <title>{`${view.name} · Seedwake`}</title>
      <BackLink to={`/w/${workspace.id}/strategies`}>← All strategies</BackLink>
      <PageTitle
        eyebrow={field ? `Strategy · ${field.name}` : 'Strategy'}
        title={view.name}
        lead={
          editable
            ? view.description || undefined
            : `${view.description ? `${view.description} ` : ''}You can read this strategy; editors in the workspace can change it.`
        }
      />
      <StrategyBuilder
        key={view.id}
        view={view}
        fields={fields}
        editable={editable}
        saving={update.isPending}
        saveError={update.error}
        onSave={(body) => update.mutateAsync(body)}
        actions={
          editable ? (
            <ConfirmDelete
              what="strategy"
              name={view.name}
              pending={remove.isPending}
              error={remove.error}
              onConfirm={() =>
                remove.mutate(view.id, {
                  onSuccess: () => void navigate(`/w/${workspace.id}/strategies`, { replace: true }),
                })
              }
            />
          ) : undefined
        }
      />
    </div>
  );
}
