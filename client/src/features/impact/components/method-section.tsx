import { Card } from '../../../components/ui/feedback';
import { useT } from '../../../lib/i18n';
import { useMethod } from '../api/get-method';
import { FactorTable } from './display';
import { MethodNotes } from './method-notes';

export function MethodSection() {
  const t = useT();
  const { data: method } = useMethod();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="method-heading">
        <h2 id="method-heading" className="text-lg">
          {t('figures.method.heading')}
        </h2>
        <div className="mt-2 space-y-3 text-sm leading-relaxed">
          <MethodNotes method={method} />
          <p>{method.displacementSource}</p>
          {method.categories.length > 0 && (
            <details>
              <summary className="min-h-11 cursor-pointer py-2 font-bold text-navy">
                {t('figures.method.factorsOf', { n: method.categories.length })}
              </summary>
              <div className="overflow-x-auto">
                <FactorTable categories={method.categories} />
              </div>
            </details>
          )}
        </div>
      </section>
    </Card>
  );
}
