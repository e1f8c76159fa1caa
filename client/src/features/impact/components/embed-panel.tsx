import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useT } from '../../../lib/i18n';

const attr = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

export function EmbedPanel({ id, groupId, groupName }: { id: string; groupId: number; groupName?: string }) {
  const t = useT();
  const [copied, setCopied] = useState<'ok' | 'failed' | null>(null);
  const title = groupName ? t('figures.embed.titleGroup', { name: groupName }) : t('figures.embed.title');
  const snippet = `<iframe src="${window.location.origin}${paths.embed(groupId)}" width="360" height="260" style="border:0" title="${attr(title)}"></iframe>`;
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(snippet);
      setCopied('ok');
    } catch {
      setCopied('failed');
    }
  };
  return (
    <Card className="p-4 sm:p-5">
      <div id={id} className="grid gap-4 lg:grid-cols-[1fr_auto]">
        <div className="min-w-0 space-y-2">
          <h2 className="text-lg">{t('figures.embed.heading')}</h2>
          <p className="text-sm text-ink-soft">{t('figures.embed.lead')}</p>
          <label htmlFor={`${id}-code`} className="sr-only">
            {t('figures.embed.code')}
          </label>
          <textarea
            id={`${id}-code`}
            readOnly
            rows={4}
            value={snippet}
            onFocus={(e) => e.currentTarget.select()}
            className="block w-full rounded-lg border border-ink/20 bg-paper px-3 py-2 font-mono text-xs text-ink"
          />
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={copy}>{t('figures.embed.copy')}</Button>
            <p role="status" className="text-sm font-semibold">
              {copied === 'ok' && <span className="text-sage">{t('figures.embed.copied')}</span>}
              {copied === 'failed' && <span className="text-alert">{t('figures.embed.copyFailed')}</span>}
            </p>
          </div>
        </div>
        <div className="min-w-0">
          <p className="mb-1 text-sm font-semibold text-ink-soft">{t('figures.embed.preview')}</p>
          <div className="max-w-full overflow-x-auto">
            <iframe
              src={paths.embed(groupId)}
              width={360}
              height={260}
              style={{ border: 0, maxWidth: '100%' }}
              title={t('figures.embed.previewTitle', { title })}
              className="rounded-xl bg-white"
            />
          </div>
        </div>
      </div>
    </Card>
  );
}
