import { Link, useLocation } from 'react-router-dom';
import { passwordResetRequestBody, RESET_LINK_MINUTES } from '../../../../shared/api/password-reset';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { useRequestPasswordReset } from './api';
import { AuthFrame } from './AuthFrame';
import { prefilledEmail } from './prefill';

const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** Asks for a reset link. The answer is the same whether or not an account uses the address. */
export function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const form = useForm({ email: prefilledEmail(useLocation().state) });

  const submit = () => {
    if (request.isPending) return;
    const parsed = passwordResetRequestBody.safeParse(form.values);
    if (!parsed.success) {
      request.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    request.mutate(parsed.data, { onError: (error) => form.setErrors(serverFieldErrors(error)) });
  };

  return (
    <AuthFrame>
      <title>Forgot your password? · Seedwake</title>
      <h1 className="text-4xl font-semibold">Forgot your password?</h1>
      {request.isSuccess ? (
        <div
          role="status"
          className="mt-6 flex flex-col gap-3 rounded-seed border-l-4 border-sprout-600 bg-sprout-100 px-4 py-3"
        >
          <p className="font-medium text-humus-900">{request.data.message}</p>
          <p className="text-humus-900">
            Look in the inbox of <span className="font-medium">{form.values.email}</span>, and in its spam
            folder if nothing arrives within a few minutes.
          </p>
        </div>
      ) : (
        <>
          <p className="mt-2 text-loam-700">
            Give the e-mail address of your account. Seedwake sends a link to choose a new password; it works
            once, for {RESET_LINK_MINUTES} minutes.
          </p>
          <form onSubmit={form.onSubmit(submit)} noValidate className="mt-8 flex flex-col gap-5">
            <FormAlert error={request.error} />
            <TextField
              label="E-mail"
              type="email"
              autoComplete="email"
              spellCheck={false}
              required
              {...form.field('email')}
            />
            <Button type="submit" pending={request.isPending} pendingLabel="Sending…" className="mt-1 w-full">
              Send the link
            </Button>
          </form>
        </>
      )}
      <p className="mt-8 border-t border-silt-300 pt-6 text-loam-700">
        Remembered it?{' '}
        <Link to="/sign-in" className={linkClass}>
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
