import type { ReactNode } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { passwordResetBody } from '../../../../shared/api/password-reset';
import { Button, buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { NewPasswordFields } from '../../shared/components/NewPasswordFields';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { serverFieldErrors, useForm } from '../../shared/lib/forms';
import { checkNewPassword } from '../../shared/lib/newPassword';
import { usePasswordResetLookup, useResetPassword } from './api';
import { AuthFrame } from './AuthFrame';
import type { EmailState } from './prefill';

/** A link that cannot be used: what happened and the way to a new one. */
function Refusal({ code, title, children }: { code: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby="reset-title" className="flex flex-col items-start gap-4">
      <p className="font-mono text-sm tracking-wide text-russet-700">{code}</p>
      <h1 id="reset-title" className="text-4xl font-semibold">
        {title}
      </h1>
      <p className="text-lg text-loam-700">{children}</p>
      <Link to="/forgot-password" className={buttonClasses('primary')}>
        Ask for a new link
      </Link>
    </section>
  );
}

const empty = { newPassword: '', repeatPassword: '' };

function NewPasswordForm({ token, email }: { token: string; email: string }) {
  const reset = useResetPassword(token);
  const navigate = useNavigate();
  const form = useForm(empty);

  const submit = () => {
    if (reset.isPending) return;
    const checked = checkNewPassword(passwordResetBody, form.values);
    if (!checked.ok) {
      reset.reset();
      form.setErrors(checked.errors);
      return;
    }
    form.setErrors({});
    reset.mutate(checked.body, {
      onSuccess: () =>
        void navigate('/sign-in?reset=done', { replace: true, state: { email } satisfies EmailState }),
      onError: (error) => form.setErrors(serverFieldErrors(error)),
    });
  };

  return (
    <>
      <h1 className="text-4xl font-semibold">Choose a new password</h1>
      <p className="mt-2 text-loam-700">
        For <span className="font-medium text-humus-900">{email}</span>. Every place you are signed in is
        signed out, and you sign in again with the new password.
      </p>
      <form onSubmit={form.onSubmit(submit)} noValidate className="mt-8 flex flex-col gap-5">
        <FormAlert error={reset.error} />
        {/* Lets password managers file the new password under the right account. */}
        <input type="email" name="username" value={email} autoComplete="username" readOnly hidden />
        <NewPasswordFields
          newPassword={form.field('newPassword')}
          repeatPassword={form.field('repeatPassword')}
        />
        <Button type="submit" pending={reset.isPending} pendingLabel="Saving…" className="mt-1 w-full">
          Save the new password
        </Button>
      </form>
    </>
  );
}

export function ResetPasswordPage() {
  const { token = '' } = useParams();
  const lookup = usePasswordResetLookup(token);

  let body: ReactNode;
  if (lookup.isPending) body = <LoadingNotice>Checking the link…</LoadingNotice>;
  else if (lookup.isError) {
    const e = lookup.error;
    body =
      e instanceof ApiRequestError && (e.status === 404 || e.status === 400) ? (
        <Refusal code="404 · no such link" title="This reset link does not work">
          It may be mistyped or cut short. Copy the whole link from the e-mail, or ask for a new one.
        </Refusal>
      ) : (
        <ErrorNotice
          title="Seedwake could not check the link"
          error={e}
          onRetry={() => void lookup.refetch()}
        />
      );
  } else if (lookup.data.state === 'used') {
    body = (
      <Refusal code="410 · already used" title="This reset link has already been used">
        Each link works once. If you changed your password with it, sign in with the new one; otherwise ask
        for a new link.
      </Refusal>
    );
  } else if (lookup.data.state === 'expired') {
    body = (
      <Refusal code="410 · expired" title="This reset link has expired">
        Reset links work for one hour. Ask for a new one; it comes by e-mail in a minute or two.
      </Refusal>
    );
  } else body = <NewPasswordForm token={token} email={lookup.data.email} />;

  return (
    <AuthFrame>
      <title>Reset your password · Seedwake</title>
      {body}
    </AuthFrame>
  );
}
