import { useT } from '../../../lib/i18n';
import type { Method } from '../api/types';
import { useFormats } from './display';

/** The method's lines, the displacement factor and the source of the emission factors, as every impact page says them. */
export function MethodNotes({
  method,
}: {
  method: Pick<Method, 'text' | 'displacement' | 'displacementNote' | 'factorSource'>;
}) {
  const t = useT();
  const { whole } = useFormats();
  return (
    <>
      <ul className="list-disc space-y-1 pl-5">
        {method.text.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      <p>
        <span className="font-bold">
          {t('figures.method.displacement', { factor: whole.format(method.displacement) })}
        </span>{' '}
        {method.displacementNote}
      </p>
      <p>
        <span className="font-bold">{t('figures.method.emissionFactors')}</span> {method.factorSource}
      </p>
    </>
  );
}
