import { Link, Navigate, useLocation, useSearchParams } from 'react-router-dom';
import { signInBody } from '../../../../shared/api/auth';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { useMe, useSignIn } from './api';
import { AuthFrame } from './AuthFrame';
import { prefilledEmail, type EmailState } from './prefill';
import { safeReturnPath } from './returnTo';

export function SignInPage() {
  const [params] = useSearchParams();
  const next = safeReturnPath(params.get('next'));
  const me = useMe();
  const signIn = useSignIn();
  const justReset = params.get('reset') === 'done';
  const form = useForm({ email: prefilledEmail(useLocation().state), password: '' });

  // Signed in already, or just now: go where the person was heading.
  if (me.data) return <Navigate to={next} replace />;

  const submit = () => {
    if (signIn.isPending) return;
    const parsed = signInBody.safeParse(form.values);
    if (!parsed.success) {
      signIn.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    signIn.mutate(parsed.data, { onError: (error) => form.setErrors(serverFieldErrors(error)) });
  };

  const signUpLink = params.get('next') ? `/sign-up?next=${encodeURIComponent(next)}` : '/sign-up';

  return (
    <AuthFrame>
      <title>Sign in · Seedwake</title>
      <h1 className="text-4xl font-semibold">Sign in</h1>
      {justReset ? (
        <p
          role="status"
          className="mt-3 rounded-seed border-l-4 border-sprout-600 bg-sprout-100 px-4 py-3 text-humus-900"
        >
          Your password was changed and every session was signed out. Sign in with the new password.
        </p>
      ) : (
        <p className="mt-2 text-loam-700">
          Welcome back. Your fields and projections are where you left them.
        </p>
      )}
      <form onSubmit={form.onSubmit(submit)} noValidate className="mt-8 flex flex-col gap-5">
        <FormAlert error={signIn.error} />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          spellCheck={false}
          required
          {...form.field('email')}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          required
          {...form.field('password')}
        />
        <Link
          to="/forgot-password"
          state={{ email: form.values.email } satisfies EmailState}
          className="-mt-2 self-start text-sm font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
        >
          Forgot your password?
        </Link>
        <Button type="submit" pending={signIn.isPending} pendingLabel="Signing in…" className="mt-1 w-full">
          Sign in
        </Button>
      </form>
      <p className="mt-8 border-t border-silt-300 pt-6 text-loam-700">
        New to Seedwake?{' '}
        <Link
          to={signUpLink}
          className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
        >
          Create an account
        </Link>
      </p>
    </AuthFrame>
  );
}
