import { Card } from '../../../components/ui/feedback';
import { ChangePasswordForm } from './change-password-form';
import { TwoFactorPanel } from './two-factor-panel';
import { useT } from '../../../lib/i18n';

/** The signed-in person's password and, for admins, the second step at sign-in. */
export function SignInSettingsCard() {
  const t = useT();
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('account.settings.title')}</h2>
      <p className="text-sm text-ink-soft">{t('account.settings.lead')}</p>
      <ChangePasswordForm />
      <TwoFactorPanel />
    </Card>
  );
}
