import type { ImportJobView } from '../../../../../shared/api/imports';
import { Alert } from '../../../components/ui/feedback';
import { useLanguage, useT } from '../../../lib/i18n';
import { formatsFor } from './display';
import { fieldWord, problemWords } from './import-words';

/** One import: a progress bar while it works, then its counts and every row it refused, with the reason. */
export function ImportProgress({ job }: { job: ImportJobView }) {
  const t = useT();
  const { whole, percent: pct } = formatsFor(useLanguage());
  const readable = Math.max(0, job.total - job.refused);
  const share = job.status === 'done' ? 1 : readable ? Math.min(1, job.done / readable) : 0;
  const percent = Math.round(share * 100);
  return (
    <div className="space-y-4">
      <div>
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <p className="font-bold text-navy">
            {t(`figures.import.status.${job.status}`)} · {job.fileName}
          </p>
          <p className="text-sm text-ink-soft">{pct(share)}</p>
        </div>
        <div
          role="progressbar"
          aria-label={t('figures.import.progressOf', { file: job.fileName })}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          className="mt-2 h-3 overflow-hidden rounded-full bg-ink/10"
        >
          <div
            className={`h-full rounded-full transition-[width] ${job.status === 'failed' ? 'bg-alert' : 'bg-sage'}`}
            style={{ width: `${percent}%` }}
          />
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-3 text-center sm:grid-cols-4">
        {[
          [t('figures.import.rows'), job.total],
          [t('figures.import.broughtIn'), job.imported],
          [t('figures.import.hereAlready'), job.skipped],
          [t('figures.import.refused'), job.refused],
        ].map(([label, n]) => (
          <div key={label} className="rounded-lg bg-paper px-2 py-3">
            <dt className="text-xs font-semibold text-ink-soft">{label}</dt>
            <dd className="text-xl font-bold text-navy">{whole.format(Number(n))}</dd>
          </div>
        ))}
      </dl>
      {job.status === 'failed' && <Alert tone="error">{job.message ?? t('figures.import.stopped')}</Alert>}
      {job.skipped > 0 && <p className="text-sm text-ink-soft">{t('figures.import.skippedNote')}</p>}
      {job.errors.length > 0 && (
        <div>
          <h3 className="font-bold">{t('figures.import.leftOut')}</h3>
          <p className="text-sm text-ink-soft">
            {t('figures.import.correct')}
            {job.refused > job.errors.length &&
              ` ${t('figures.import.firstShown', { shown: job.errors.length, total: job.refused })}`}
          </p>
          <div className="mt-2 max-h-96 overflow-auto rounded-lg ring-1 ring-ink/10">
            <table className="w-full text-left text-sm">
              <thead className="sticky top-0 bg-white">
                <tr>
                  <th className="px-3 py-2">{t('figures.import.row')}</th>
                  <th className="px-3 py-2">{t('figures.import.column')}</th>
                  <th className="px-3 py-2">{t('figures.col.reason')}</th>
                </tr>
              </thead>
              <tbody>
                {job.errors.map((e) => (
                  <tr key={`${e.row}-${e.field}`} className="border-t border-ink/5">
                    <td className="px-3 py-2 tabular-nums">{e.row}</td>
                    <td className="px-3 py-2">{fieldWord(t, e.field)}</td>
                    <td className="px-3 py-2">{problemWords(t, e)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </div>
      )}
    </div>
  );
}
