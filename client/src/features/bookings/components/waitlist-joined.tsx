import { Link } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Card } from '../../../components/ui/feedback';
import { useLanguage, useT } from '../../../lib/i18n';

/** What the visitor sees after joining a time's waiting list. */
export function WaitlistJoined(props: {
  position: number;
  slot?: { startsAt: string; endsAt: string };
  day: string;
  timeZone: string;
  backTo: string;
}) {
  const t = useT();
  const lang = useLanguage();
  const { slot, timeZone: tz } = props;
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">{t('booking.waitlist.title')}</h1>
      <p className="mt-2">
        {t('booking.waitlist.body', {
          position: props.position,
          time: slot ? formatTimeRange(slot.startsAt, slot.endsAt, tz, lang) : '',
          day: formatDay(props.day, tz, lang),
        })}
      </p>
      <Link to={props.backTo} className="mt-4 inline-block font-bold text-navy underline">
        {t('booking.backToSession')}
      </Link>
    </Card>
  );
}
