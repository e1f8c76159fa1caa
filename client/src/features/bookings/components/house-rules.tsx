import type { UseFormRegisterReturn } from 'react-hook-form';
import { Link } from 'react-router';
import { Card } from '../../../components/ui/feedback';
import { tr, useT } from '../../../lib/i18n';

/** The group's house rules and the conditions, with the visitor's consent box. */
export function HouseRules(props: {
  step: number;
  houseRules: string;
  groupName: string;
  /** The group's privacy page: what it keeps of the visitor's details and for how long. */
  privacyPath: string;
  consent: UseFormRegisterReturn;
  error?: string;
}) {
  const t = useT();
  return (
    <Card>
      <h2 className="text-lg">{t('booking.step.rules', { n: props.step })}</h2>
      {props.houseRules && <h3 className="mt-3 text-sm font-bold">{props.groupName}</h3>}
      {props.houseRules && (
        <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
          {props.houseRules
            .split('\n')
            .filter(Boolean)
            .map((l) => (
              <li key={l}>{l}</li>
            ))}
        </ul>
      )}
      <h3 className="mt-3 text-sm font-bold">{t('booking.rules.everywhere')}</h3>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-sm text-ink-soft">
        {[1, 2, 3].map((n) => (
          <li key={n}>{t(`booking.rules.d${n}`)}</li>
        ))}
      </ul>
      <label className="mt-4 flex items-start gap-3 rounded-lg p-3 ring-1 ring-ink/15">
        <input type="checkbox" className="mt-0.5 size-5 accent-copper" {...props.consent} />
        <span>{t('booking.rules.consent')}</span>
      </label>
      {props.error && <p className="mt-1 text-sm font-semibold text-alert">{tr(props.error)}</p>}
      <p className="mt-3 text-sm">
        <Link to={props.privacyPath} className="font-bold text-navy underline">
          {t('booking.rules.privacy', { group: props.groupName })}
        </Link>
      </p>
    </Card>
  );
}
