import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentUser } from '../../shared/lib/session';
import { NameForm } from './NameForm';
import { NotificationSettingsForm } from './NotificationSettingsForm';
import { PasswordForm } from './PasswordForm';

export function AccountPage() {
  const user = useCurrentUser();
  return (
    <div className="flex flex-col gap-8">
      <title>Your account · Seedwake</title>
      <PageTitle
        eyebrow="Account"
        title="Your account"
        lead={
          <>
            Signed in as <span className="font-medium text-humus-900">{user.email}</span>.
          </>
        }
      />
      <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
        <Panel>
          <NameForm />
        </Panel>
        <Panel>
          <PasswordForm />
        </Panel>
        <Panel>
          <NotificationSettingsForm />
        </Panel>
      </div>
    </div>
  );
}
