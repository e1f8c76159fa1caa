import { useNavigate } from 'react-router';
import { PageTitle } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { SignInSettingsCard } from '../../features/auth/components/sign-in-card';
import { AccountDataPanel } from '../../features/privacy/components/account-data-panel';
import { forgetCsrfToken } from '../../lib/api';
import { userKeys } from '../../lib/auth';
import { queryClient } from '../../lib/query-client';
import { useT } from '../../lib/i18n';

/** The signed-in person's own account: password and sign-in, a copy of the account, and closing it. */
export function MyDataPage() {
  const t = useT();
  const navigate = useNavigate();
  const closed = () => {
    forgetCsrfToken();
    queryClient.clear();
    queryClient.setQueryData(userKeys.me, null);
    void navigate(paths.home(), { replace: true });
  };
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <PageTitle title={t('account.page.title')} lead={t('account.page.lead')} />
      <SignInSettingsCard />
      <AccountDataPanel onClosed={closed} />
    </div>
  );
}
