import { SafetyNote } from '~/components/SafetyNote';
import { summaryBlocks } from '~/lib/library/summary';
import { figureValue, LIBRARY_DIGITS } from '~/lib/library/figures';
import { resultFigure } from '~/lib/design/figures';
import { formatSi } from '~/lib/format';
import KeyFigures from './KeyFigures';

type Props = { design: unknown; result: unknown; headline?: boolean };

/**
 * A design's inputs as given and its key results with units, as static tables. Used where the full designer
 * viewer is not wanted (shared links, old revisions); renders on the server without hydration.
 */
export default function DesignFacts({ design, result, headline = true }: Props) {
  const blocks = summaryBlocks({ design, result, measured: [] });
  const energy = figureValue(result, resultFigure('tankEnergy'));
  return (
    <div className="space-y-6">
      {headline && <KeyFigures result={result} />}
      {result === null && <p className="cw-alert">This design no longer passes the current checks, so no results are shown.</p>}
      <div className="grid gap-6 md:grid-cols-2">
        {blocks.map((b) => (
          <section key={b.title} className="cw-card" aria-label={b.title}>
            <h3 className="mb-2 text-lg">{b.title}</h3>
            <table className="w-full text-sm">
              <tbody>
                {b.rows.map(([label, value]) => (
                  <tr key={label} className="border-b border-rule last:border-b-0">
                    <th scope="row" className="py-1 pr-3 text-left font-normal text-ink-soft">
                      {label}
                    </th>
                    <td className="py-1 text-right font-medium tabular-nums">{value}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            {b.title === 'Decides the build' && typeof energy === 'number' && (
              <SafetyNote kind="stored-energy" className="mt-3">
                <p className="mt-1">This tank stores about {formatSi(energy, 'J', LIBRARY_DIGITS)} at the supply peak.</p>
              </SafetyNote>
            )}
          </section>
        ))}
      </div>
    </div>
  );
}
