import type { Method } from '../api/types';

/** The method's lines, the displacement factor and the source of the emission factors, as every impact page says them. */
export function MethodNotes({
  method,
}: {
  method: Pick<Method, 'text' | 'displacement' | 'displacementNote' | 'factorSource'>;
}) {
  return (
    <>
      <ul className="list-disc space-y-1 pl-5">
        {method.text.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      <p>
        <span className="font-bold">Displacement factor {method.displacement}.</span> {method.displacementNote}
      </p>
      <p>
        <span className="font-bold">Emission factors:</span> {method.factorSource}
      </p>
    </>
  );
}
