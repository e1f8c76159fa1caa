import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Card, PageTitle } from '../../components/ui/feedback';
import { privacyNoticeQuery, usePrivacyNotice } from '../../features/privacy/api/get-privacy-notice';
import { queryClient } from '../../lib/query-client';
import { useT } from '../../lib/i18n';

export const loader = ({ params }: LoaderFunctionArgs) =>
  queryClient.ensureQueryData(privacyNoticeQuery(Number(params.groupId)));

/** A group's privacy page, written from its settings: what it keeps about visitors, why, how long, whom to ask. */
export function GroupPrivacyPage() {
  const groupId = Number(useParams().groupId);
  const { data: notice } = usePrivacyNotice(groupId);
  const t = useT();
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <PageTitle title={t('common.privacy.title', { group: notice.groupName })} lead={t('common.privacy.lead')} />
      {notice.sections.map((s) => (
        <Card key={s.heading} className="space-y-2">
          <h2 className="text-lg">{s.heading}</h2>
          {s.paragraphs.map((p) => (
            <p key={p}>{p}</p>
          ))}
        </Card>
      ))}
    </div>
  );
}
