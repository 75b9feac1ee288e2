import { useCallback, useEffect, useState, type ChangeEvent, type FormEvent } from 'react';
import type { z } from 'zod';
import { ApiRequestError } from './apiFetch';

export type FieldErrors = Record<string, string>;

/** The first message for each top-level field, in the shape the server sends in `fields`. */
export function zodFieldErrors(error: z.ZodError): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of error.issues) {
    const key = String(issue.path[0] ?? '');
    if (key !== '' && !(key in errors)) errors[key] = issue.message;
  }
  return errors;
}

export function serverFieldErrors(error: unknown): FieldErrors {
  return error instanceof ApiRequestError ? error.fields : {};
}

type Values = Record<string, string>;

/**
 * Form state that never loses what the person typed: values live here, not in the
 * mutation, so a rejected submit leaves them in place. Editing a field clears only that
 * field's message. After a failed submit, focus moves to the first field with a message
 * so keyboard and screen-reader users land on the problem.
 */
export function useForm<T extends Values>(initial: T) {
  const [values, setValues] = useState<T>(initial);
  const [errors, setErrorsState] = useState<FieldErrors>({});
  // The form element is kept in state (set on submit) rather than a ref, so nothing reads
  // a ref during render. Every failed submit bumps the counter, which moves focus again.
  const [formElement, setFormElement] = useState<HTMLFormElement | null>(null);
  const [failedSubmits, setFailedSubmits] = useState(0);

  useEffect(() => {
    if (failedSubmits === 0) return;
    formElement?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [failedSubmits, formElement]);

  const setErrors = useCallback((next: FieldErrors) => {
    setErrorsState(next);
    if (Object.keys(next).length > 0) setFailedSubmits((n) => n + 1);
  }, []);

  /** Wraps a submit handler: no page reload, and the form is remembered for moving focus. */
  const onSubmit = (handler: () => void) => (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setFormElement(event.currentTarget);
    handler();
  };

  const field = (name: keyof T & string) => ({
    name,
    value: values[name],
    error: errors[name],
    onChange: (event: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
      const value = event.target.value;
      setValues((current) => ({ ...current, [name]: value }));
      setErrorsState((current) => {
        if (!(name in current)) return current;
        const rest = { ...current };
        delete rest[name];
        return rest;
      });
    },
  });

  return { values, setValues, errors, setErrors, field, onSubmit };
}
