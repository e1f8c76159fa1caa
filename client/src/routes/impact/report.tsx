import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Button } from '../../components/ui/button';
import type { EventReport } from '../../features/impact/api/types';
import { paths } from '../../config/paths';
import { eventReportQuery, useEventReport } from '../../features/impact/api/get-event-report';
import { groupReportQuery, useGroupReport } from '../../features/impact/api/get-group-report';
import { useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';
import { ReportBody } from '../../features/impact/components/report-body';

const PRINT_CSS = `@page { size: A4; margin: 14mm }
@media print { html, body { margin: 0; padding: 0; background: #fff !important; } tfoot { display: table-row-group; } }`;

/** The page reads what the loader fetched; a failure to fetch it is the route's error. */
export const loader = ({ params, request }: LoaderFunctionArgs) => {
  const search = new URL(request.url).searchParams;
  const warm = params.eventId
    ? queryClient.ensureQueryData(eventReportQuery(Number(params.eventId)))
    : queryClient.ensureQueryData(
        groupReportQuery(Number(params.groupId), search.get('from') || undefined, search.get('to') || undefined),
      );
  return warm;
};

/**
 * One page per session for funders and the group's own records: what came in, what was fixed, who helped and how
 * it was counted. Printed from the browser; the toolbar stays on screen only.
 */
export function EventReportPage() {
  const t = useT();
  const eventId = Number(useParams().eventId);
  return (
    <ReportShell
      report={useEventReport(eventId).data}
      back={{ to: paths.manageEvent(eventId), label: `← ${t('figures.report.backSession')}` }}
    />
  );
}

/** The same report for a group's sessions between two dates (?from=&to=). */
export function GroupReportPage() {
  const t = useT();
  const groupId = Number(useParams().groupId);
  const [params] = useSearchParams();
  return (
    <ReportShell
      report={useGroupReport(groupId, params.get('from') || undefined, params.get('to') || undefined).data}
      back={{ to: paths.impact(groupId), label: `← ${t('figures.report.backImpact')}` }}
    />
  );
}

function ReportShell({ report, back }: { report: EventReport; back: { to: string; label: string } }) {
  const t = useT();
  return (
    <div className="min-h-dvh bg-neutral-200 text-ink print:min-h-0 print:bg-white">
      <title>{t('figures.report.docTitle', { title: report.event.title })}</title>
      <style>{PRINT_CSS}</style>

      <div className="sticky top-0 z-10 border-b border-ink/10 bg-white shadow-sm print:hidden">
        <div className="mx-auto flex max-w-[210mm] flex-wrap items-center justify-between gap-3 px-4 py-3">
          <Link to={back.to} className="text-sm font-bold text-navy underline">
            {back.label}
          </Link>
          <Button onClick={() => window.print()}>{t('figures.report.print')}</Button>
        </div>
      </div>

      <div className="px-2 py-6 sm:px-4 print:p-0">
        <ReportBody r={report} />
      </div>
    </div>
  );
}
