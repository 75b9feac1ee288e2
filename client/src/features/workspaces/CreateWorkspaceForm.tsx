import { useNavigate } from 'react-router-dom';
import { createWorkspaceBody } from '../../../../shared/api/workspaces';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { useCreateWorkspace } from './api';

/** A new workspace for a client or a class; its creator becomes its owner and lands in it. */
export function CreateWorkspaceForm({ onCreated }: { onCreated?: () => void }) {
  const create = useCreateWorkspace();
  const navigate = useNavigate();
  const form = useForm({ name: '' });

  const submit = () => {
    if (create.isPending) return;
    const parsed = createWorkspaceBody.safeParse(form.values);
    if (!parsed.success) {
      create.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    create.mutate(parsed.data, {
      onSuccess: (workspace) => {
        form.setValues({ name: '' });
        onCreated?.();
        void navigate(`/w/${workspace.id}`);
      },
      onError: (error) => form.setErrors(serverFieldErrors(error)),
    });
  };

  return (
    <form onSubmit={form.onSubmit(submit)} noValidate className="flex flex-col gap-3">
      <FormAlert error={create.error} />
      <TextField
        label="New workspace"
        hint="For example a client’s farm or a class."
        required
        {...form.field('name')}
      />
      <Button
        type="submit"
        variant="secondary"
        size="sm"
        pending={create.isPending}
        pendingLabel="Creating…"
        className="self-start"
      >
        Create workspace
      </Button>
    </form>
  );
}
