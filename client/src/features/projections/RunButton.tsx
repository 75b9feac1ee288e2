import { useNavigate } from 'react-router-dom';
import type { LaunchBody } from '../../../../shared/api/scenarios';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useLaunch } from './api';

/**
 * Launches a scenario (every strategy and No control) and opens the new comparison, where
 * progress shows. A full queue answers 429; the alert says when to try again.
 */
export function RunButton({
  scenarioId,
  body = {},
  label = 'Run',
  variant = 'primary',
  disabled = false,
  beforeLaunch,
}: {
  scenarioId: string;
  body?: LaunchBody;
  label?: string;
  variant?: 'primary' | 'secondary';
  disabled?: boolean;
  /** Runs first (e.g. saving the form); the launch goes ahead when it resolves to true. */
  beforeLaunch?: () => Promise<boolean>;
}) {
  const workspace = useCurrentWorkspace();
  const navigate = useNavigate();
  const launch = useLaunch(workspace.id);
  const run = async () => {
    if (beforeLaunch && !(await beforeLaunch())) return;
    launch.mutate(
      { scenarioId, body },
      { onSuccess: (launched) => navigate(`/w/${workspace.id}/batches/${launched.batchId}`) },
    );
  };
  return (
    <div className="flex flex-col items-start gap-2">
      <Button
        variant={variant}
        pending={launch.isPending}
        pendingLabel="Launching…"
        disabled={disabled}
        onClick={() => void run()}
      >
        {label}
      </Button>
      <FormAlert error={launch.error} />
    </div>
  );
}
