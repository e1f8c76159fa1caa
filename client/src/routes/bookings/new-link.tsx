import { Card, PageTitle } from '../../components/ui/feedback';
import { FreshLinkForm } from '../../features/bookings/components/fresh-link-form';

/** Where a visitor who lost the mail with their booking link asks for a fresh one. */
export function FreshLinkPage() {
  return (
    <div className="mx-auto max-w-lg space-y-5">
      <PageTitle
        title="Lost your booking link?"
        lead="Your booking page (QR code, moving and cancelling) opens from the link we mailed you."
      />
      <Card>
        <FreshLinkForm />
      </Card>
    </div>
  );
}
