import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { accountDataUrl, useCloseAccount } from '../api/personal-data';

/** A volunteer's own data: a copy of the account, and closing it. */
export function AccountDataPanel({ onClosed }: { onClosed: () => void }) {
  const [asking, setAsking] = useState(false);
  const close = useCloseAccount(onClosed);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">Your account</h2>
      <p className="text-sm text-ink-soft">
        Download everything your account holds: your name and address, your groups, skills and kit, your shifts and the
        repairs you were given.
      </p>
      <a
        href={accountDataUrl()}
        download="mendery-account.json"
        className="inline-flex min-h-11 items-center rounded-lg px-4 py-2 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5 focus-visible:outline-3 focus-visible:outline-copper"
      >
        Download my account
      </a>
      <div className="border-t border-ink/5 pt-3">
        {close.error && <Alert tone="error">{close.error.message}</Alert>}
        <Button variant="danger" onClick={() => setAsking(true)}>
          Close my account
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title="Close your account?"
        message="Your name, e-mail address, password, skills, kit, future shifts and group memberships will be removed and you will be signed out. Repairs you recorded stay in the group's records, without your name. This cannot be undone."
        confirmLabel="Close my account"
        busy={close.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => close.mutate(undefined, { onSettled: () => setAsking(false) })}
      />
    </Card>
  );
}
