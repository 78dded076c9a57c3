import { resultFigure, type ResultFigureId } from '~/lib/design/figures';
import { figureValue, showFigure } from '~/lib/library/figures';

type Props = { result: unknown };

const shown: readonly ResultFigureId[] = ['loadedFrequency', 'tapTurns', 'k'];

/** The three numbers a builder looks for first: loaded frequency, tap and coupling. */
export default function KeyFigures({ result }: Props) {
  return (
    <dl className="grid gap-3 sm:grid-cols-3">
      {shown.map((key) => {
        const f = resultFigure(key);
        return (
          <div key={key} className="cw-card">
            <dt className="text-sm text-ink-soft">{f.short ?? f.label}</dt>
            <dd className="text-2xl font-semibold" data-figure={key}>
              {showFigure(f, figureValue(result, f))}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
