import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Alert, Card } from '../../../components/ui/feedback';
import { accountDataUrl, useCloseAccount } from '../api/personal-data';
import { useT } from '../../../lib/i18n';

/** A volunteer's own data: a copy of the account, and closing it. */
export function AccountDataPanel({ onClosed }: { onClosed: () => void }) {
  const t = useT();
  const [asking, setAsking] = useState(false);
  const close = useCloseAccount(onClosed);
  return (
    <Card className="space-y-3">
      <h2 className="text-lg">{t('account.data.title')}</h2>
      <p className="text-sm text-ink-soft">{t('account.data.lead')}</p>
      <a
        href={accountDataUrl()}
        download="mendery-account.json"
        className="inline-flex min-h-11 items-center rounded-lg px-4 py-2 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5 focus-visible:outline-3 focus-visible:outline-copper"
      >
        {t('account.data.download')}
      </a>
      <div className="border-t border-ink/5 pt-3">
        {close.error && <Alert tone="error">{close.error.message}</Alert>}
        <Button variant="danger" onClick={() => setAsking(true)}>
          {t('account.data.close')}
        </Button>
      </div>
      <ConfirmDialog
        open={asking}
        title={t('account.data.confirmTitle')}
        message={t('account.data.confirm')}
        confirmLabel={t('account.data.close')}
        busy={close.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => close.mutate(undefined, { onSettled: () => setAsking(false) })}
      />
    </Card>
  );
}
