import { Alert, Card, Spinner } from '../../../components/ui/feedback';
import { useMethod } from '../api/get-method';
import { FactorTable } from './display';

export function MethodSection() {
  const method = useMethod();
  return (
    <Card className="p-4 sm:p-5">
      <section aria-labelledby="method-heading">
        <h2 id="method-heading" className="text-lg">
          Method and sources
        </h2>
        {method.isPending ? (
          <Spinner label="Loading the method…" />
        ) : method.isError ? (
          <Alert tone="error" title="The method could not be loaded">
            {method.error.message}
          </Alert>
        ) : (
          <div className="mt-2 space-y-3 text-sm leading-relaxed">
            <ul className="list-disc space-y-1 pl-5">
              {method.data.text.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
            <p>
              <span className="font-bold">Displacement factor {method.data.displacement}.</span>{' '}
              {method.data.displacementNote}
            </p>
            <p>
              <span className="font-bold">Emission factors:</span> {method.data.factorSource}
            </p>
            {method.data.categories.length > 0 && (
              <details>
                <summary className="min-h-11 cursor-pointer py-2 font-bold text-navy">
                  Weights and factors of the {method.data.categories.length} categories
                </summary>
                <div className="overflow-x-auto">
                  <FactorTable categories={method.data.categories} />
                </div>
              </details>
            )}
          </div>
        )}
      </section>
    </Card>
  );
}
