import { useId, useRef, useState } from 'react';
import { roles, type Role } from '../../../../shared/api/auth';
import { createTokenBody, type CreatedToken, type TokenView } from '../../../../shared/api/tokens';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { SelectField } from '../../shared/components/SelectField';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors, useForm, zodFieldErrors } from '../../shared/lib/forms';
import { roleNames } from '../../shared/lib/roles';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCreateToken, useRevokeToken, useTokens } from './api';

/** A workspace the person belongs to, with their role there (from the workspaces feature, composed in the app). */
export type Membership = { id: string; name: string; role: Role };

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const date = (iso: string) => <time dateTime={iso}>{when.format(new Date(iso))}</time>;

/** Roles no higher than the person's own: roles are listed highest first. */
const rolesUpTo = (own: Role) => roles.slice(roles.indexOf(own));

/**
 * Personal API tokens: a script uses one instead of a browser session. Each is scoped to
 * one workspace and a role no higher than the person's there. The secret is shown once,
 * right after creation; Seedwake stores only its hash.
 */
export function TokensSection({ memberships }: { memberships: readonly Membership[] }) {
  const tokens = useTokens();
  const [created, setCreated] = useState<CreatedToken | null>(null);

  return (
    <section aria-labelledby="tokens-title" className="flex flex-col gap-6">
      <div>
        <h2 id="tokens-title" className="text-2xl font-semibold">
          API tokens
        </h2>
        <p className="max-w-prose text-loam-700">
          For scripts that create and fetch projections without a browser: send the token as{' '}
          <code className="rounded-sm bg-silt-200 px-1 font-mono text-sm">Authorization: Bearer …</code>. A
          token acts in one workspace, with the role you give it, never more than your own.
        </p>
      </div>
      {created ? <NewSecret token={created} onDone={() => setCreated(null)} /> : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] lg:items-start">
        <div className="rounded-seed border border-silt-300 bg-white p-5 shadow-sheet sm:p-6">
          <h3 className="mb-3 text-xl font-semibold">Your tokens</h3>
          {tokens.isPending ? (
            <LoadingNotice>Loading your tokens…</LoadingNotice>
          ) : tokens.isError ? (
            <ErrorNotice
              title="Your tokens could not be loaded"
              error={tokens.error}
              onRetry={() => void tokens.refetch()}
            />
          ) : tokens.data.length === 0 ? (
            <p className="text-loam-700">No tokens yet.</p>
          ) : (
            <TokenTable tokens={tokens.data} />
          )}
        </div>
        <div className="rounded-seed border border-silt-300 bg-white p-5 shadow-sheet sm:p-6">
          <CreateTokenForm memberships={memberships} onCreated={setCreated} />
        </div>
      </div>
    </section>
  );
}

function TokenTable({ tokens }: { tokens: TokenView[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Your API tokens</caption>
        <thead className="text-loam-700">
          <tr>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Name
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Workspace · role
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Starts with
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Created
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Last used
            </th>
            <th scope="col" className="py-2">
              <span className="sr-only">Revoke</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {tokens.map((t) => (
            <TokenRow key={t.id} token={t} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

function TokenRow({ token }: { token: TokenView }) {
  const revoke = useRevokeToken();
  const [confirming, setConfirming] = useState(false);
  return (
    <tr className="border-t border-silt-200 align-top">
      <th scope="row" className="py-2 pr-3 font-medium">
        {token.name}
      </th>
      <td className="py-2 pr-3">
        {token.workspaceName} · {roleNames[token.role]}
      </td>
      <td className="py-2 pr-3 font-mono">{token.prefix}…</td>
      <td className="py-2 pr-3">{date(token.createdAt)}</td>
      <td className="py-2 pr-3">{token.lastUsedAt ? date(token.lastUsedAt) : 'never'}</td>
      <td className="py-2 text-right">
        {confirming ? (
          <span
            role="group"
            aria-label={`Confirm revoking ${token.name}`}
            className="flex flex-wrap justify-end gap-1"
          >
            <Button
              variant="danger"
              size="sm"
              pending={revoke.isPending}
              pendingLabel="Revoking…"
              onClick={() => revoke.mutate(token.id)}
            >
              Revoke “{token.name}”
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
              Keep
            </Button>
          </span>
        ) : (
          <Button variant="quiet" size="sm" onClick={() => setConfirming(true)}>
            Revoke<span className="sr-only"> {token.name}</span>
          </Button>
        )}
        {revoke.error ? (
          <p role="alert" className="mt-1 text-sm font-medium text-danger-700">
            {revoke.error.message}
          </p>
        ) : null}
      </td>
    </tr>
  );
}

function CreateTokenForm({
  memberships,
  onCreated,
}: {
  memberships: readonly Membership[];
  onCreated: (token: CreatedToken) => void;
}) {
  const create = useCreateToken();
  const first = memberships[0];
  // Least privilege first: a token starts as a viewer; the person raises it if the script must write.
  const form = useForm({ name: '', workspaceId: first?.id ?? '', role: 'viewer' });
  // The list may arrive after the form first renders; until one is chosen, the first workspace is meant.
  const workspaceId = memberships.some((m) => m.id === form.values.workspaceId)
    ? form.values.workspaceId
    : (first?.id ?? '');
  const own = memberships.find((m) => m.id === workspaceId)?.role ?? 'viewer';
  const allowed = rolesUpTo(own);
  // A role chosen for one workspace may be above the person's role in the next one chosen.
  const role = allowed.includes(form.values.role as Role) ? (form.values.role as Role) : allowed[0];

  if (memberships.length === 0)
    return <p className="text-loam-700">You belong to no workspace to make a token for.</p>;

  const submit = () => {
    if (create.isPending) return;
    const parsed = createTokenBody.safeParse({ ...form.values, workspaceId, role });
    if (!parsed.success) {
      create.reset();
      form.setErrors(zodFieldErrors(parsed.error));
      return;
    }
    form.setErrors({});
    create.mutate(parsed.data, {
      onSuccess: (token) => {
        form.setValues({ name: '', workspaceId, role });
        onCreated(token);
      },
      onError: (error) => form.setErrors(serverFieldErrors(error)),
    });
  };

  return (
    <form
      onSubmit={form.onSubmit(submit)}
      noValidate
      aria-labelledby="create-token-title"
      className="flex flex-col gap-4"
    >
      <h3 id="create-token-title" className="text-xl font-semibold">
        Create a token
      </h3>
      <FormAlert error={create.error} />
      <TextField label="Name" hint="What uses it, e.g. “sweep script”." required {...form.field('name')} />
      <SelectField
        label="Workspace"
        {...form.field('workspaceId')}
        value={workspaceId}
        options={memberships.map((m) => ({
          value: m.id,
          label: `${m.name} (you: ${roleNames[m.role].toLowerCase()})`,
        }))}
      />
      <SelectField
        label="Role"
        hint={`At most your own role in this workspace (${roleNames[own].toLowerCase()}).`}
        {...form.field('role')}
        value={role}
        options={allowed.map((r) => ({ value: r, label: roleNames[r] }))}
      />
      <Button type="submit" pending={create.isPending} pendingLabel="Creating…" className="self-start">
        Create token
      </Button>
    </form>
  );
}

/** The secret, once: with a copy button and a plain warning that it will not be shown again. */
function NewSecret({ token, onDone }: { token: CreatedToken; onDone: () => void }) {
  const id = useId();
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const secretRef = useRef<HTMLInputElement>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(token.token);
      setCopied('yes');
    } catch {
      // Without clipboard access (an insecure origin, a refused permission) the text is selected instead.
      secretRef.current?.select();
      setCopied('failed');
    }
  };
  return (
    <div
      role="alert"
      aria-labelledby={`${id}-title`}
      className="flex flex-col gap-3 rounded-seed border-2 border-clay-600 bg-clay-100 p-5 text-humus-900"
    >
      <p id={`${id}-title`} className="font-semibold">
        Token “{token.name}” created for {token.workspaceName} ({roleNames[token.role].toLowerCase()}).
      </p>
      <p>
        <span className="font-semibold">Copy it now: Seedwake will not show it again.</span> Only its hash is
        stored; if you lose it, revoke it and create a new one.
      </p>
      <div className="flex flex-wrap items-stretch gap-2">
        <label htmlFor={`${id}-secret`} className="sr-only">
          The new token
        </label>
        <input
          id={`${id}-secret`}
          ref={secretRef}
          readOnly
          value={token.token}
          onFocus={(event) => event.currentTarget.select()}
          className="min-h-11 min-w-0 flex-1 rounded-seed border border-loam-400 bg-white px-3 font-mono text-sm"
        />
        <Button onClick={() => void copy()}>Copy token</Button>
      </div>
      <p role="status" className="text-sm font-medium">
        {copied === 'yes'
          ? '✓ Copied to the clipboard.'
          : copied === 'failed'
            ? 'Copying is blocked here: the token is selected, press Ctrl+C (⌘C).'
            : ''}
      </p>
      <Button variant="secondary" size="sm" className="self-start" onClick={onDone}>
        I have copied it
      </Button>
    </div>
  );
}
