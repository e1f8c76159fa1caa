import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useClearMailbox } from '../../features/admin/api/clear-mailbox';
import { useMail, mailQuery } from '../../features/admin/api/get-mail';
import { useMailbox, mailboxQuery } from '../../features/admin/api/get-mailbox';
import { queryClient } from '../../lib/query-client';
import { tr, useLanguage, useT } from '../../lib/i18n';
import { intlLocale } from '../../../../shared/format';
import type { Language } from '../../../../shared/i18n/languages';

/** When a mail arrived, to the second, as the reader's language writes it. */
const received = (at: string | Date, lang: Language) =>
  new Intl.DateTimeFormat(intlLocale(lang), { dateStyle: 'medium', timeStyle: 'medium' }).format(new Date(at));

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  Promise.all([
    queryClient.ensureQueryData(mailboxQuery()),
    params.mailId ? queryClient.ensureQueryData(mailQuery(Number(params.mailId))) : null,
  ]).catch(() => null);

/** The local mailbox: every mail Mendery sent while it runs with its own SMTP catcher. */
export function MailboxPage() {
  const t = useT();
  const lang = useLanguage();
  const selected = Number(useParams().mailId) || null;
  const list = useMailbox();
  const clear = useClearMailbox();
  const [confirming, setConfirming] = useState(false);
  return (
    <div>
      <PageTitle title={t('admin.mailbox.title')} lead={t('admin.mailbox.lead')} />
      <div className="grid gap-4 lg:grid-cols-[22rem_1fr]">
        <Card flush className="overflow-hidden">
          <div className="flex items-center justify-between border-b border-ink/5 px-4 py-3">
            <h2 className="text-base">{t('admin.mailbox.count', { n: list.data?.length ?? 0 })}</h2>
            <Button variant="quiet" disabled={!list.data?.length} onClick={() => setConfirming(true)}>
              {t('admin.mailbox.deleteAll')}
            </Button>
          </div>
          {list.isPending && (
            <div className="px-4">
              <Spinner />
            </div>
          )}
          {list.error && (
            <div className="p-4">
              <Alert tone="error">{tr(list.error.message)}</Alert>
            </div>
          )}
          {list.data?.length === 0 && (
            <div className="p-4">
              <EmptyState title={t('admin.mailbox.empty')} icon="✉">
                {t('admin.mailbox.emptyBody')}
              </EmptyState>
            </div>
          )}
          <ul className="max-h-[70vh] overflow-y-auto">
            {list.data?.map((m) => (
              <li key={m.id}>
                <Link
                  to={paths.adminMailbox(m.id)}
                  className={`block border-b border-ink/5 px-4 py-3 hover:bg-navy/5 ${selected === m.id ? 'bg-copper-light/50' : ''}`}
                >
                  <span className="block truncate font-bold">{m.subject}</span>
                  <span className="block truncate text-sm text-ink-soft">{t('admin.mailbox.to', { to: m.to })}</span>
                  <span className="text-xs text-ink-soft">{received(m.receivedAt, lang)}</span>
                </Link>
              </li>
            ))}
          </ul>
        </Card>
        {selected ? <MailView id={selected} /> : <EmptyState title={t('admin.mailbox.choose')} icon="✉" />}
      </div>
      <ConfirmDialog
        open={confirming}
        title={t('admin.mailbox.emptyQuestion')}
        message={t('admin.mailbox.emptyMessage')}
        confirmLabel={t('admin.mailbox.emptyConfirm')}
        busy={clear.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() => clear.mutate(undefined, { onSettled: () => setConfirming(false) })}
      />
    </div>
  );
}

function MailView({ id }: { id: number }) {
  const t = useT();
  const lang = useLanguage();
  const mail = useMail(id);
  const [tab, setTab] = useState<'html' | 'text'>('html');
  if (mail.isPending)
    return (
      <Card>
        <Spinner />
      </Card>
    );
  if (mail.error) return <Alert tone="error">{tr(mail.error.message)}</Alert>;
  const m = mail.data;
  const view = m.hasHtml ? tab : 'text';
  return (
    <Card className="space-y-3">
      <div>
        <h2 className="text-xl">{m.subject}</h2>
        <p className="text-sm text-ink-soft">
          {t('admin.mailbox.fromTo', { from: m.from, to: m.to })} · {received(m.receivedAt, lang)}
        </p>
      </div>
      <div role="tablist" className="flex gap-1">
        {m.hasHtml && (
          <button
            role="tab"
            aria-selected={view === 'html'}
            onClick={() => setTab('html')}
            className={`rounded-lg px-3 py-1 font-semibold ${view === 'html' ? 'bg-navy text-white' : 'text-navy'}`}
          >
            {t('admin.mailbox.rendered')}
          </button>
        )}
        <button
          role="tab"
          aria-selected={view === 'text'}
          onClick={() => setTab('text')}
          className={`rounded-lg px-3 py-1 font-semibold ${view === 'text' ? 'bg-navy text-white' : 'text-navy'}`}
        >
          {t('admin.mailbox.plain')}
        </button>
      </div>
      {view === 'html' ? (
        <iframe
          title={t('admin.mailbox.frame')}
          sandbox="allow-popups allow-popups-to-escape-sandbox"
          src={`/api/admin/mailbox/${m.id}/html`}
          className="h-[60vh] w-full rounded-lg border border-ink/10 bg-white"
        />
      ) : (
        <pre className="max-h-[60vh] overflow-auto whitespace-pre-wrap rounded-lg bg-paper p-4 text-sm">{m.text}</pre>
      )}
    </Card>
  );
}
