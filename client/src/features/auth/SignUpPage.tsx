import { Link, Navigate, useLocation, useSearchParams } from 'react-router-dom';
import { signUpBody, type SessionView } from '../../../../shared/api/auth';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { useMe, useSignUp } from './api';
import { AuthFrame } from './AuthFrame';
import { prefilledEmail } from './prefill';
import { safeReturnPath } from './returnTo';

/** Someone who signed up from an invitation lands in the workspace that invited them. */
function landingPath(session: SessionView, invited: boolean, next: string): string {
  const shared = session.memberships.find((m) => !m.workspace.personal);
  return invited && shared ? `/w/${shared.workspace.id}` : next;
}

export function SignUpPage() {
  const [params] = useSearchParams();
  const invitationToken = params.get('invitation') ?? undefined;
  const next = safeReturnPath(params.get('next'));
  const me = useMe();
  const signUp = useSignUp();
  // An invitation's page passes the invited address along, so the person need not retype it.
  const form = useForm({ name: '', email: prefilledEmail(useLocation().state), password: '' });

  if (me.data) return <Navigate to={landingPath(me.data, invitationToken !== undefined, next)} replace />;

  const submit = () => {
    if (signUp.isPending) return;
    const parsed = signUpBody.safeParse({ ...form.values, ...(invitationToken ? { invitationToken } : {}) });
    if (!parsed.success) {
      signUp.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    signUp.mutate(parsed.data, { onError: (error) => form.setErrors(serverFieldErrors(error)) });
  };

  return (
    <AuthFrame>
      <title>Create an account · Seedwake</title>
      <h1 className="text-4xl font-semibold">Create your account</h1>
      {invitationToken ? (
        <p className="mt-3 rounded-seed border-l-4 border-clay-500 bg-clay-100 px-4 py-3 text-humus-900">
          You were invited to a workspace. Once your account exists you will find it there, alongside a
          workspace of your own.
        </p>
      ) : (
        <p className="mt-2 text-loam-700">
          You get a workspace of your own to start in; you can invite others later.
        </p>
      )}
      <form onSubmit={form.onSubmit(submit)} noValidate className="mt-8 flex flex-col gap-5">
        <FormAlert error={signUp.error} />
        <TextField
          label="Your name"
          hint="Shown to the people you work with."
          autoComplete="name"
          required
          {...form.field('name')}
        />
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
          hint="At least 12 characters. A few unrelated words make a strong one."
          autoComplete="new-password"
          required
          {...form.field('password')}
        />
        <Button
          type="submit"
          pending={signUp.isPending}
          pendingLabel="Creating your account…"
          className="mt-1 w-full"
        >
          Create account
        </Button>
      </form>
      <p className="mt-8 border-t border-silt-300 pt-6 text-loam-700">
        Already have an account?{' '}
        <Link
          to={
            // Someone invited who has an account after all goes back to the invitation after signing in.
            invitationToken
              ? `/sign-in?next=${encodeURIComponent(`/invitations/${invitationToken}`)}`
              : params.get('next')
                ? `/sign-in?next=${encodeURIComponent(next)}`
                : '/sign-in'
          }
          className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
        >
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
