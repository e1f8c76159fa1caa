import { Card } from '../../../components/ui/feedback';
import { ChangePasswordForm } from './change-password-form';
import { TwoFactorPanel } from './two-factor-panel';

/** The signed-in person's password and, for admins, the second step at sign-in. */
export function SignInSettingsCard() {
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Password and sign-in</h2>
      <p className="text-sm text-ink-soft">
        Saving a new password signs you out on every other device, and we mail you a note that it changed.
      </p>
      <ChangePasswordForm />
      <TwoFactorPanel />
    </Card>
  );
}
