import { resultFigure, type ResultFigureId } from '~/lib/design/figures';
import { formatTurns } from '~/lib/format';
import { figureValue, showFigure } from '~/lib/library/figures';

type Props = { result: unknown; /** the tap for values adopted on the bench, when any were adopted */ calibratedTap?: number | null };

const shown: readonly ResultFigureId[] = ['loadedFrequency', 'tapTurns', 'k'];

/** The three numbers a builder looks for first: loaded frequency, tap (calibrated once measured) and coupling. */
export default function KeyFigures({ result, calibratedTap = null }: Props) {
  return (
    <dl className="grid gap-3 sm:grid-cols-3">
      {shown.map((key) => {
        const f = resultFigure(key);
        const predicted = figureValue(result, f);
        if (key === 'tapTurns' && calibratedTap !== null) {
          return (
            <div key={key} className="cw-card">
              <dt className="text-sm text-ink-soft">Primary tap, from the measurement</dt>
              <dd className="text-2xl font-semibold" data-figure={key}>
                {formatTurns(calibratedTap)}
              </dd>
              <dd className="text-sm text-ink-soft" data-figure="tapTurns-predicted">
                predicted {formatTurns(predicted)}
              </dd>
            </div>
          );
        }
        return (
          <div key={key} className="cw-card">
            <dt className="text-sm text-ink-soft">{f.short ?? f.label}</dt>
            <dd className="text-2xl font-semibold" data-figure={key}>
              {showFigure(f, predicted)}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
