import { Link } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../../shared/format';
import { Card } from '../../../components/ui/feedback';

/** What the visitor sees after joining a time's waiting list. */
export function WaitlistJoined(props: {
  position: number;
  slot?: { startsAt: string; endsAt: string };
  day: string;
  timeZone: string;
  backTo: string;
}) {
  const { slot, timeZone: tz } = props;
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl">You are on the waiting list</h1>
      <p className="mt-2">
        You are number <strong>{props.position}</strong> in line for{' '}
        {slot && formatTimeRange(slot.startsAt, slot.endsAt, tz)} on {formatDay(props.day, tz)}. If a place comes free
        we will mail you a link to take it.
      </p>
      <Link to={props.backTo} className="mt-4 inline-block font-bold text-navy underline">
        Back to the session
      </Link>
    </Card>
  );
}
