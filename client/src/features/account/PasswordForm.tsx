import { useState } from 'react';
import { changePasswordBody } from '../../../../shared/api/auth';
import { FormAlert } from '../../shared/components/FormAlert';
import { NewPasswordFields } from '../../shared/components/NewPasswordFields';
import { SubmitRow } from '../../shared/components/SubmitRow';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm } from '../../shared/lib/forms';
import { checkNewPassword } from '../../shared/lib/newPassword';
import { useChangePassword } from './api';

const empty = { currentPassword: '', newPassword: '', repeatPassword: '' };

export function PasswordForm() {
  const change = useChangePassword();
  const form = useForm(empty);
  const [changed, setChanged] = useState(false);

  const submit = () => {
    if (change.isPending) return;
    setChanged(false);
    const checked = checkNewPassword(changePasswordBody, form.values);
    if (!checked.ok) {
      change.reset();
      form.setErrors(checked.errors);
      return;
    }
    form.setErrors({});
    change.mutate(checked.body, {
      onSuccess: () => {
        form.setValues(empty);
        setChanged(true);
      },
      onError: (error) => form.setErrors(serverFieldErrors(error)),
    });
  };

  return (
    <form
      onSubmit={form.onSubmit(submit)}
      noValidate
      aria-labelledby="password-form-title"
      className="flex flex-col gap-5"
    >
      <h2 id="password-form-title" className="text-xl font-semibold">
        Password
      </h2>
      <FormAlert error={change.error} />
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        required
        {...form.field('currentPassword')}
      />
      <NewPasswordFields
        newPassword={form.field('newPassword')}
        repeatPassword={form.field('repeatPassword')}
      />
      <SubmitRow
        label="Change password"
        pending={change.isPending}
        pendingLabel="Changing…"
        done={changed ? 'Password changed.' : null}
      />
    </form>
  );
}
