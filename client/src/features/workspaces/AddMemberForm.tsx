import { useState } from 'react';
import { addMemberBody } from '../../../../shared/api/workspaces';
import { roles } from '../../../../shared/api/auth';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { SelectField } from '../../shared/components/SelectField';
import { TextField } from '../../shared/components/TextField';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { roleNames } from '../../shared/lib/roles';
import { useAddMember } from './api';

const roleOptions = roles.map((role) => ({ value: role, label: roleNames[role] }));

/** "No account with that e-mail" and "already a member" are about the e-mail, so they sit beside it. */
function isAboutTheEmail(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError && (error.status === 404 || error.status === 409);
}

export function AddMemberForm({ workspaceId }: { workspaceId: string }) {
  const add = useAddMember(workspaceId);
  const form = useForm({ email: '', role: 'editor' });
  const [added, setAdded] = useState<string | null>(null);

  const submit = () => {
    if (add.isPending) return;
    setAdded(null);
    const parsed = addMemberBody.safeParse(form.values);
    if (!parsed.success) {
      add.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    add.mutate(parsed.data, {
      onSuccess: (member) => {
        setAdded(`${member.user.name} joined as ${roleNames[member.role].toLowerCase()}.`);
        form.setValues({ email: '', role: form.values.role });
      },
      onError: (error) => {
        const fields = serverFieldErrors(error);
        form.setErrors(
          isAboutTheEmail(error) && !fields.email ? { ...fields, email: error.message } : fields,
        );
      },
    });
  };

  return (
    <form
      onSubmit={form.onSubmit(submit)}
      noValidate
      aria-labelledby="add-member-title"
      className="flex flex-col gap-4"
    >
      <div>
        <h2 id="add-member-title" className="text-xl font-semibold">
          Add a member
        </h2>
        <p className="mt-1 text-sm text-loam-700">
          They need a Seedwake account already. Invitations by e-mail to people without one come later.
        </p>
      </div>
      <FormAlert error={isAboutTheEmail(add.error) ? null : add.error} />
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_12rem_auto] sm:items-start">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          spellCheck={false}
          required
          {...form.field('email')}
        />
        <SelectField label="Role" options={roleOptions} {...form.field('role')} />
        <Button
          type="submit"
          pending={add.isPending}
          pendingLabel="Adding…"
          className="sm:mt-[1.875rem] sm:min-h-[2.875rem]"
        >
          Add member
        </Button>
      </div>
      {added ? (
        <p role="status" className="text-sm font-medium text-humus-900">
          <span aria-hidden="true">✓ </span>
          {added}
        </p>
      ) : null}
    </form>
  );
}
