import type { ReactNode } from 'react';
import { Link } from 'react-router';

/** The top of an organiser's page about one session: the way back to the group's sessions, the title, when. */
export function SessionHeading(props: { back: { to: string; label: string }; title: ReactNode; when: ReactNode }) {
  return (
    <div className="mb-3">
      <Link to={props.back.to} className="text-sm font-bold text-navy underline">
        ← {props.back.label}
      </Link>
      <h1 className="mt-2 text-2xl sm:text-3xl">{props.title}</h1>
      <p className="font-bold text-copper-dark">{props.when}</p>
    </div>
  );
}
