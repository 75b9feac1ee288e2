import { useState } from 'react';
import { updateAccountBody } from '../../../../shared/api/auth';
import { FormAlert } from '../../shared/components/FormAlert';
import { SubmitRow } from '../../shared/components/SubmitRow';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { useCurrentUser } from '../../shared/lib/session';
import { useUpdateAccount } from './api';

export function NameForm() {
  const user = useCurrentUser();
  const update = useUpdateAccount();
  const form = useForm({ name: user.name });
  const [saved, setSaved] = useState(false);

  const submit = () => {
    if (update.isPending) return;
    setSaved(false);
    const parsed = updateAccountBody.safeParse(form.values);
    if (!parsed.success) {
      update.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    update.mutate(parsed.data, {
      onSuccess: (updated) => {
        form.setValues({ name: updated.name });
        setSaved(true);
      },
      onError: (error) => form.setErrors(serverFieldErrors(error)),
    });
  };

  return (
    <form
      onSubmit={form.onSubmit(submit)}
      noValidate
      aria-labelledby="name-form-title"
      className="flex flex-col gap-5"
    >
      <h2 id="name-form-title" className="text-xl font-semibold">
        Your name
      </h2>
      <FormAlert error={update.error} />
      <TextField
        label="Name"
        hint="Shown to the people in your workspaces and on reports."
        autoComplete="name"
        required
        {...form.field('name')}
      />
      <SubmitRow
        label="Save name"
        pending={update.isPending}
        pendingLabel="Saving…"
        done={saved ? 'Name saved.' : null}
      />
    </form>
  );
}
