import { Link } from 'react-router';
import { ROLE_LABELS, type GroupRole } from '../../../shared/constants';
import { Card, EmptyState, PageTitle } from '../components/ui/feedback';
import { paths } from '../config/paths';
import { useUser } from '../features/auth/api/get-me';
import { groupsWithRole } from '../lib/roles';

/** The landing page of fixers (`bench`) and reception (`desk`): the groups they serve and what comes next. */
export function VolunteerHome({ role }: { role: Extract<GroupRole, 'fixer' | 'host'> }) {
  const { data: user } = useUser();
  if (!user) return null;
  const groups = groupsWithRole(user, role);
  const title = role === 'fixer' ? 'My bench' : 'Reception desk';
  return (
    <div className="space-y-6">
      <PageTitle title={title} lead={`Hello ${user.name.split(' ')[0]}. You are ${ROLE_LABELS[role].toLowerCase()} with ${groups.map((g) => g.groupName).join(' and ')}.`} />
      <div className="grid gap-4 md:grid-cols-2">
        {groups.map((g) => (
          <Card key={g.groupId}>
            <h2 className="text-lg">{g.groupName}</h2>
            <p className="text-sm text-ink-soft">Your roles here: {user.roles.filter((r) => r.groupId === g.groupId).map((r) => ROLE_LABELS[r.role]).join(', ')}</p>
          </Card>
        ))}
      </div>
      <EmptyState title={role === 'fixer' ? 'No items are waiting for you' : 'No session is running today'} icon={role === 'fixer' ? '⚒' : '☑'}>
        {role === 'fixer'
          ? 'When an organiser plans a session and items are matched to you, they appear here in order, with the visitor’s description.'
          : 'On the day of a session, today’s bookings appear here for check-in.'}
      </EmptyState>
      <p className="text-sm text-ink-soft">
        Before you open anything that runs on mains, read <Link to={paths.safety()} className="font-semibold text-navy underline">safety at the bench</Link>.
      </p>
    </div>
  );
}
