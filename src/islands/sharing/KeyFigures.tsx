import { figureValue, keyFigures } from '~/lib/library/figures';
import { formatSI, formatTurns } from '~/lib/library/format';

type Props = { result: unknown };

const shown = ['loadedFrequency', 'tapTurns', 'k'] as const;
const titles: Record<(typeof shown)[number], string> = { loadedFrequency: 'Loaded resonant frequency', tapTurns: 'Primary tap', k: 'Coupling k' };

/** The three numbers a builder looks for first: loaded frequency, tap and coupling. */
export default function KeyFigures({ result }: Props) {
  return (
    <dl className="grid gap-3 sm:grid-cols-3">
      {shown.map((key) => {
        const f = keyFigures.find((x) => x.key === key)!;
        const v = figureValue(result, f);
        return (
          <div key={key} className="cw-card">
            <dt className="text-sm text-ink-soft">{titles[key]}</dt>
            <dd className="text-2xl font-semibold" data-figure={key}>
              {f.unit === 'turns' ? formatTurns(v) : formatSI(v, f.unit)}
            </dd>
          </div>
        );
      })}
    </dl>
  );
}
