import { useState, type ReactNode } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import type { z } from 'zod';
import { roles, type Role } from '../../../../shared/api/auth';
import type { ApiRequestError } from '../lib/apiFetch';
import { serverFieldErrors, useForm, zodFieldErrors } from '../lib/forms';
import { roleNames } from '../lib/roles';
import { Button } from './Button';
import { FormAlert } from './FormAlert';
import { SelectField } from './SelectField';
import { TextField } from './TextField';

type EmailRoleBody = { email: string; role: Role };

const roleOptions = roles.map((role) => ({ value: role, label: roleNames[role] }));

type EmailRoleFormProps<R> = {
  titleId: string;
  title: string;
  lead: ReactNode;
  initialRole: Role;
  schema: z.ZodType<EmailRoleBody>;
  mutation: UseMutationResult<R, Error, EmailRoleBody>;
  submitLabel: string;
  pendingLabel: string;
  /** Refusals that are about the address, shown beside the E-mail field instead of above the form. */
  isAboutTheEmail: (error: unknown) => error is ApiRequestError;
  /** The confirmation read out after a success. */
  describe: (result: R) => string;
};

/**
 * One e-mail and one role, sent to the server: how owners add members and invite people.
 * After a success the e-mail is cleared and the role kept, for the next person.
 */
export function EmailRoleForm<R>({
  titleId,
  title,
  lead,
  initialRole,
  schema,
  mutation,
  submitLabel,
  pendingLabel,
  isAboutTheEmail,
  describe,
}: EmailRoleFormProps<R>) {
  const form = useForm<{ email: string; role: string }>({ email: '', role: initialRole });
  const [done, setDone] = useState<string | null>(null);

  const submit = () => {
    if (mutation.isPending) return;
    setDone(null);
    const parsed = schema.safeParse(form.values);
    if (!parsed.success) {
      mutation.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    mutation.mutate(parsed.data, {
      onSuccess: (result) => {
        setDone(describe(result));
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
      aria-labelledby={titleId}
      className="flex flex-col gap-4"
    >
      <div>
        <h2 id={titleId} className="text-xl font-semibold">
          {title}
        </h2>
        <p className="mt-1 text-sm text-loam-700">{lead}</p>
      </div>
      <FormAlert error={isAboutTheEmail(mutation.error) ? null : mutation.error} />
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
          pending={mutation.isPending}
          pendingLabel={pendingLabel}
          className="sm:mt-[1.875rem] sm:min-h-[2.875rem]"
        >
          {submitLabel}
        </Button>
      </div>
      {done ? (
        <p role="status" className="text-sm font-medium text-humus-900">
          <span aria-hidden="true">✓ </span>
          {done}
        </p>
      ) : null}
    </form>
  );
}
