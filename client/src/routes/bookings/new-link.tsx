import { Card, PageTitle } from '../../components/ui/feedback';
import { FreshLinkForm } from '../../features/bookings/components/fresh-link-form';
import { useT } from '../../lib/i18n';

/** Where a visitor who lost the mail with their booking link asks for a fresh one. */
export function FreshLinkPage() {
  const t = useT();
  return (
    <div className="mx-auto max-w-lg space-y-5">
      <PageTitle title={t('booking.fresh.pageTitle')} lead={t('booking.fresh.pageLead')} />
      <Card>
        <FreshLinkForm />
      </Card>
    </div>
  );
}
