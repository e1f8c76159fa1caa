import { Link } from 'react-router';
import { paths } from '../config/paths';
import { usePublicGroups, publicGroupsQuery } from '../features/groups/api/get-public-groups';
import { Alert, Spinner } from '../components/ui/feedback';
import { queryClient } from '../lib/query-client';

const steps = [
  {
    n: '1',
    title: 'Book a slot',
    text: 'Pick a session near you and a time, and tell us what is broken. Booking keeps the queue short.',
  },
  {
    n: '2',
    title: 'Bring it along',
    text: 'Bring the item, its charger or loose parts, and the story of what went wrong and when.',
  },
  {
    n: '3',
    title: 'Mend it together',
    text: 'Sit with a volunteer fixer, watch, learn and help. Mains items get a safety check before they go home.',
  },
];

/** Warms the cache; a failure is left for the page, which says what went wrong in its own words. */
export const loader = () => queryClient.ensureQueryData(publicGroupsQuery()).catch(() => null);

export function HomePage() {
  const groups = usePublicGroups();
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-8 md:grid-cols-[1.2fr_1fr]">
        <div className="space-y-5">
          <p className="inline-block rounded-full bg-copper-light px-3 py-1 text-sm font-bold text-copper-dark">
            Community repair sessions
          </p>
          <h1 className="text-4xl leading-tight sm:text-5xl">
            Bring the broken thing. Leave with it working — and knowing how.
          </h1>
          <p className="max-w-xl text-lg text-ink-soft">
            Volunteer fixers in your town look at kettles, lamps, laptops, clothes, bikes and toys with you, for free.
            Mendery lets you book a place, and helps the groups plan benches, fixers and parts.
          </p>
          <div className="flex flex-wrap gap-3">
            <Link
              to={paths.events()}
              className="inline-flex min-h-11 items-center rounded-lg bg-copper px-5 font-bold text-white hover:bg-copper-dark"
            >
              Find a session and book
            </Link>
            <Link
              to={paths.volunteer()}
              className="inline-flex min-h-11 items-center rounded-lg bg-white px-5 font-bold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
            >
              Volunteer as a fixer
            </Link>
          </div>
        </div>
        <HeroPicture />
      </section>

      <section aria-labelledby="how">
        <h2 id="how" className="mb-4 text-2xl">
          How a session works
        </h2>
        <ol className="grid gap-4 sm:grid-cols-3">
          {steps.map((s) => (
            <li key={s.n} className="rounded-xl bg-white p-5 shadow-sm ring-1 ring-ink/5">
              <span className="flex size-9 items-center justify-center rounded-full bg-navy font-extrabold text-white">
                {s.n}
              </span>
              <h3 className="mt-3 text-lg">{s.title}</h3>
              <p className="mt-1 text-ink-soft">{s.text}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="groups">
        <h2 id="groups" className="mb-4 text-2xl">
          Repair groups on Mendery
        </h2>
        {groups.isPending && <Spinner label="Loading groups…" />}
        {groups.error && <Alert tone="error">Could not load the groups: {groups.error.message}</Alert>}
        {groups.data?.length === 0 && <Alert>No repair group has joined yet.</Alert>}
        <div className="grid gap-4 sm:grid-cols-2">
          {groups.data?.map((g) => (
            <Link
              key={g.id}
              to={`${paths.events()}?group=${g.id}`}
              className="block rounded-xl bg-white p-5 shadow-sm ring-1 ring-ink/5 hover:ring-copper"
            >
              <h3 className="text-lg">{g.name}</h3>
              <p className="text-sm font-semibold text-copper-dark">{g.town}</p>
              <p className="mt-2 text-ink-soft">{g.description}</p>
              <p className="mt-3 text-sm font-bold text-navy underline">See its sessions</p>
            </Link>
          ))}
        </div>
      </section>

      <section className="rounded-xl bg-navy p-6 text-white sm:p-8">
        <h2 className="text-2xl text-white">Not everything can come to the table</h2>
        <p className="mt-2 max-w-3xl text-white/85">
          By common practice groups do not take gas appliances, microwave ovens, anything with a refrigerant circuit,
          swollen lithium batteries or items whose mains cable is damaged. Each group's own house rules say what it
          takes.
        </p>
        <Link to={paths.safety()} className="mt-4 inline-block font-bold text-copper-light underline">
          Read how we keep the bench safe
        </Link>
      </section>
    </div>
  );
}

/** A drawing of a workbench: a lamp, a kettle and a spool of thread. */
function HeroPicture() {
  return (
    <svg
      viewBox="0 0 320 220"
      role="img"
      aria-label="A workbench with a lamp, a kettle and a spool of thread"
      className="w-full max-w-md justify-self-center"
    >
      <rect x="10" y="160" width="300" height="14" rx="4" fill="#23395d" />
      <rect x="30" y="174" width="12" height="40" fill="#182a46" />
      <rect x="278" y="174" width="12" height="40" fill="#182a46" />
      <path d="M60 160 L70 90 L110 60" stroke="#56606d" strokeWidth="6" fill="none" strokeLinecap="round" />
      <path d="M100 48 l40 14 -14 26 -40 -14z" fill="#b8612f" />
      <circle cx="118" cy="92" r="8" fill="#f3dcc8" />
      <rect x="150" y="110" width="60" height="50" rx="10" fill="#5d7f6a" />
      <path d="M210 122 q22 4 10 28" stroke="#5d7f6a" strokeWidth="7" fill="none" />
      <rect x="168" y="100" width="24" height="12" rx="4" fill="#dfeadf" />
      <rect x="236" y="126" width="42" height="34" rx="4" fill="#f3dcc8" />
      <rect x="232" y="122" width="50" height="8" rx="3" fill="#954c22" />
      <rect x="232" y="156" width="50" height="6" rx="3" fill="#954c22" />
      <path d="M257 126 q30 -40 50 -20" stroke="#b8612f" strokeWidth="2" fill="none" strokeDasharray="4 3" />
    </svg>
  );
}
