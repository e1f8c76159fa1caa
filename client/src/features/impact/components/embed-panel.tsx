import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';

const attr = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

export function EmbedPanel({ id, groupId, groupName }: { id: string; groupId: number; groupName?: string }) {
  const [copied, setCopied] = useState<'ok' | 'failed' | null>(null);
  const title = groupName ? `Repairs counted by ${groupName}` : 'Repairs counted with Mendery';
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
          <h2 className="text-lg">Your figures on your own website</h2>
          <p className="text-sm text-ink-soft">
            Paste this code into a page of your group’s website. The sentence and the quilt update by themselves after
            each session and name nobody.
          </p>
          <label htmlFor={`${id}-code`} className="sr-only">
            Code to paste
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
            <Button onClick={copy}>Copy the code</Button>
            <p role="status" className="text-sm font-semibold">
              {copied === 'ok' && <span className="text-sage">Copied.</span>}
              {copied === 'failed' && (
                <span className="text-alert">Copying did not work here: select the code and copy it by hand.</span>
              )}
            </p>
          </div>
        </div>
        <div className="min-w-0">
          <p className="mb-1 text-sm font-semibold text-ink-soft">How it will look</p>
          <div className="max-w-full overflow-x-auto">
            <iframe
              src={paths.embed(groupId)}
              width={360}
              height={260}
              style={{ border: 0, maxWidth: '100%' }}
              title={`How it will look: ${title}`}
              className="rounded-xl bg-white"
            />
          </div>
        </div>
      </div>
    </Card>
  );
}
