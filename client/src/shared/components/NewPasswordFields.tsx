import type { ChangeEvent } from 'react';
import { TextField } from './TextField';

type Bound = {
  name: string;
  value: string;
  error?: string;
  onChange: (event: ChangeEvent<HTMLInputElement>) => void;
};

/** A new password and its repeat, marked so password managers offer to generate and store it. */
export function NewPasswordFields({
  newPassword,
  repeatPassword,
}: {
  newPassword: Bound;
  repeatPassword: Bound;
}) {
  return (
    <>
      <TextField
        label="New password"
        type="password"
        hint="At least 12 characters. A few unrelated words make a strong one."
        autoComplete="new-password"
        required
        {...newPassword}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        required
        {...repeatPassword}
      />
    </>
  );
}
