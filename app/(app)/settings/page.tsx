import type { Metadata } from 'next';
import { PageHeader, Panel } from '@/components/ui';
import { pageUser } from '@/app/_server/session';
import { PREFERENCE_FIELDS } from './preferences';
import { PasswordForm, PreferencesForm, ProfileForm } from './SettingsForms';

export const metadata: Metadata = { title: 'Settings' };
export const dynamic = 'force-dynamic';

export default async function SettingsPage() {
  const user = await pageUser('/settings');
  const values = Object.fromEntries(Object.keys(PREFERENCE_FIELDS).map((f) => [f, user[f as keyof typeof PREFERENCE_FIELDS]]));
  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-6">
      <PageHeader title="Settings" />
      <Panel title="Profile">
        <ProfileForm name={user.name} email={user.email} />
      </Panel>
      <Panel title="Password">
        <PasswordForm hasPassword={Boolean(user.passwordHash)} />
      </Panel>
      <Panel title="E-mail">
        <PreferencesForm fields={{ ...PREFERENCE_FIELDS }} values={values} />
      </Panel>
    </div>
  );
}
