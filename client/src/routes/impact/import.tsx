import { useSuspenseQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import type { ImportPreview } from '../../../../shared/api/imports';
import { IMPORT_LIMITS } from '../../../../shared/impact/ords-import';
import { IMPORT_FIELDS, REQUIRED_FIELDS, type ImportField } from '../../../../shared/impact/open-repair-data';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Button } from '../../components/ui/button';
import { Alert, Card, EmptyState, Spinner } from '../../components/ui/feedback';
import { SelectField } from '../../components/ui/field';
import { groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { useImport } from '../../features/impact/api/get-import';
import { useImports } from '../../features/impact/api/get-imports';
import { impactKeys } from '../../features/impact/api/keys';
import { usePreviewImport } from '../../features/impact/api/preview-import';
import { useStartImport } from '../../features/impact/api/start-import';
import { ImportProgress } from '../../features/impact/components/import-progress';
import { fieldWord, kindWord } from '../../features/impact/components/import-words';
import { intlLocale } from '../../../../shared/format';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(groupSettingsQuery(Number(params.groupId)));

/** A column named like one of our fields is matched to it from the start. */
const matchByName = (header: string[]) =>
  Object.fromEntries(IMPORT_FIELDS.filter((f) => header.includes(f)).map((f) => [f, f])) as Record<string, string>;

/**
 * Bringing in a group's earlier records: choose a file, see what it is (and for a sheet of its own, say which column
 * holds what, with its first rows beside), start, and watch it go; refused rows are listed with their reasons.
 */
export function GroupImportPage() {
  const t = useT();
  const lang = useLanguage();
  const mb = IMPORT_LIMITS.maxBytes / 1024 / 1024;
  const groupId = Number(useParams().groupId);
  const { data: group } = useSuspenseQuery(groupSettingsQuery(groupId));
  const [file, setFile] = useState<File | null>(null);
  const [look, setLook] = useState<ImportPreview | null>(null);
  const [mapping, setMapping] = useState<Record<string, string>>({});
  const [jobId, setJobId] = useState<number | null>(null);
  const [tooBig, setTooBig] = useState(false);
  const preview = usePreviewImport();
  const start = useStartImport(groupId);
  const job = useImport(jobId);
  const earlier = useImports(groupId);
  const status = job.data?.status;
  useEffect(() => {
    // The list of earlier imports shows the counts an import ends with.
    if (status === 'done' || status === 'failed')
      void queryClient.invalidateQueries({ queryKey: impactKeys.imports(groupId) });
  }, [status, groupId]);

  const choose = (f: File | null) => {
    setFile(f);
    setLook(null);
    setJobId(null);
    start.reset();
    setTooBig(Boolean(f && f.size > IMPORT_LIMITS.maxBytes));
    if (!f || f.size > IMPORT_LIMITS.maxBytes) return;
    preview.mutate(f, {
      onSuccess: (p) => {
        setLook(p);
        setMapping(matchByName(p.header));
      },
    });
  };
  const missing = look?.kind === 'plain' ? REQUIRED_FIELDS.filter((f) => !mapping[f]) : [];
  const begin = () =>
    file &&
    start.mutate(
      { groupId, file, mapping: look?.kind === 'plain' ? mapping : {} },
      { onSuccess: ({ id }) => setJobId(id) },
    );

  return (
    <div>
      <div className="mb-2">
        <h1 className="text-2xl sm:text-3xl">{group.name}</h1>
        <p className="mt-1 text-ink-soft">{t('figures.import.lead')}</p>
      </div>
      <GroupTabs groupId={groupId} />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="min-w-0 space-y-6">
          <Card>
            <h2 className="text-lg">{t('figures.import.step1')}</h2>
            <p className="mt-1 text-sm text-ink-soft">{t('figures.import.fileHint', { mb })}</p>
            <label className="mt-3 block font-semibold" htmlFor="import-file">
              {t('figures.import.file')}
            </label>
            <input
              id="import-file"
              type="file"
              accept=".csv,text/csv"
              onChange={(e) => choose(e.target.files?.[0] ?? null)}
              className="mt-1 block w-full min-h-11 rounded-lg border border-ink/20 bg-white px-3 py-2 text-base file:mr-3 file:rounded-md file:border-0 file:bg-navy/10 file:px-3 file:py-1.5 file:font-semibold file:text-navy focus:outline-none focus-visible:ring-2 focus-visible:ring-copper"
            />
            <div className="mt-3 space-y-2">
              {tooBig && <Alert tone="error">{t('figures.import.tooBig', { mb })}</Alert>}
              {preview.isPending && <Spinner label={t('figures.import.reading')} />}
              {preview.error && <Alert tone="error">{preview.error.message}</Alert>}
              {look && <Alert tone="info">{kindWord(t, look.kind)}</Alert>}
            </div>
          </Card>

          {look?.kind === 'plain' && (
            <Card>
              <h2 className="text-lg">{t('figures.import.step2')}</h2>
              <p className="mt-1 text-sm text-ink-soft">{t('figures.import.columnsHint')}</p>
              <div className="mt-3 grid gap-3 sm:grid-cols-2">
                {IMPORT_FIELDS.filter((f) => f !== 'group_identifier').map((f: ImportField) => (
                  <SelectField
                    key={f}
                    label={
                      REQUIRED_FIELDS.includes(f)
                        ? t('figures.import.needed', { field: fieldWord(t, f) })
                        : fieldWord(t, f)
                    }
                    value={mapping[f] ?? ''}
                    onChange={(e) => setMapping((m) => ({ ...m, [f]: e.target.value }))}
                  >
                    <option value="">{t('figures.import.notInSheet')}</option>
                    {look.header.map((h) => (
                      <option key={h} value={h}>
                        {h}
                      </option>
                    ))}
                  </SelectField>
                ))}
              </div>
              <h3 className="mt-5 font-bold">{t('figures.import.firstRows')}</h3>
              <div
                className="mt-2 overflow-x-auto rounded-lg ring-1 ring-ink/10"
                tabIndex={0}
                aria-label={t('figures.import.firstRows')}
              >
                <table className="min-w-full text-left text-sm">
                  <thead className="bg-paper">
                    <tr>
                      {look.header.map((h) => (
                        <th key={h} className="whitespace-nowrap px-3 py-2">
                          {h}
                        </th>
                      ))}
                    </tr>
                  </thead>
                  <tbody>
                    {look.rows.map((r, i) => (
                      <tr key={i} className="border-t border-ink/5">
                        {look.header.map((h, j) => (
                          <td key={h} className="max-w-48 truncate whitespace-nowrap px-3 py-2">
                            {r[j] ?? ''}
                          </td>
                        ))}
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </Card>
          )}

          {look && (
            <Card>
              <h2 className="text-lg">{t('figures.import.stepGo', { n: look.kind === 'plain' ? 3 : 2 })}</h2>
              {missing.length > 0 && (
                <p className="mt-1 text-sm font-semibold text-alert">
                  {t('figures.import.chooseFor', {
                    fields: new Intl.ListFormat(intlLocale(lang), { type: 'conjunction' }).format(
                      missing.map((f) => fieldWord(t, f)),
                    ),
                  })}
                </p>
              )}
              {start.error && (
                <div className="mt-2">
                  <Alert tone="error">{start.error.message}</Alert>
                </div>
              )}
              <Button className="mt-3" onClick={begin} busy={start.isPending} disabled={missing.length > 0 || !!jobId}>
                {t('figures.import.go')}
              </Button>
            </Card>
          )}

          {jobId !== null && (
            <Card>
              <h2 className="sr-only">{t('figures.import.progress')}</h2>
              {job.isPending && <Spinner />}
              {job.error && <Alert tone="error">{job.error.message}</Alert>}
              {job.data && <ImportProgress job={job.data} />}
            </Card>
          )}
        </div>

        <Card className="min-w-0 self-start">
          <h2 className="text-lg">{t('figures.import.earlier')}</h2>
          {earlier.isPending && <Spinner />}
          {earlier.error && <Alert tone="error">{earlier.error.message}</Alert>}
          {earlier.data?.length === 0 && (
            <EmptyState title={t('figures.import.nothingYet')}>{t('figures.import.nothingYetText')}</EmptyState>
          )}
          <ul className="mt-2 divide-y divide-ink/5">
            {earlier.data?.map((j) => (
              <li key={j.id}>
                <button
                  type="button"
                  onClick={() => setJobId(j.id)}
                  className="flex min-h-11 w-full flex-col items-start rounded-md px-2 py-2 text-left hover:bg-navy/5 focus:outline-none focus-visible:ring-2 focus-visible:ring-copper"
                >
                  <span className="font-semibold text-navy">{j.fileName}</span>
                  <span className="text-sm text-ink-soft">
                    {new Intl.DateTimeFormat(intlLocale(lang), {
                      dateStyle: 'medium',
                      timeZone: group.timeZone,
                    }).format(new Date(j.createdAt))}{' '}
                    · {t('figures.import.counts', { imported: j.imported, skipped: j.skipped, refused: j.refused })}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        </Card>
      </div>
    </div>
  );
}
