import { useState } from 'react';
import { changePasswordBody } from '../../../../shared/api/auth';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors, type FieldErrors } from '../../shared/lib/forms';
import { useChangePassword } from './api';

const empty = { currentPassword: '', newPassword: '', repeatPassword: '' };

export function PasswordForm() {
  const change = useChangePassword();
  const form = useForm(empty);
  const [changed, setChanged] = useState(false);

  const submit = () => {
    if (change.isPending) return;
    setChanged(false);
    const { repeatPassword, ...body } = form.values;
    const parsed = changePasswordBody.safeParse(body);
    const errors: FieldErrors = parsed.success ? {} : zodFieldErrors(parsed.error);
    // Checked here only: a typo in a password nobody can see would lock the person out.
    if (repeatPassword !== body.newPassword) errors.repeatPassword = 'The two new passwords are not the same';
    if (!parsed.success || Object.keys(errors).length > 0) {
      change.reset();
      form.setErrors(errors);
      return;
    }
    form.setErrors({});
    change.mutate(parsed.data, {
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
      <TextField
        label="New password"
        type="password"
        hint="At least 12 characters. A few unrelated words make a strong one."
        autoComplete="new-password"
        required
        {...form.field('newPassword')}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        required
        {...form.field('repeatPassword')}
      />
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" pending={change.isPending} pendingLabel="Changing…">
          Change password
        </Button>
        {changed ? (
          <p role="status" className="text-sm font-medium">
            <span aria-hidden="true">✓ </span>Password changed.
          </p>
        ) : null}
      </div>
    </form>
  );
}
