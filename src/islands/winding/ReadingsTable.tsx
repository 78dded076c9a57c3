import { DATUM_LABELS } from '~/lib/winding';
import type { WindingSession } from '~/lib/api/queries/winding';
import { clockText, durationText, mmText } from './format';

/** Every reading of a session with the height's count and the flag, oldest first. */
export function ReadingsTable({ session }: { session: WindingSession }) {
  if (session.readings.length === 0) return <p className="text-sm text-ink-soft">No readings yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="readings-table">
        <caption className="sr-only">Readings</caption>
        <thead>
          <tr className="text-left">
            <th scope="col" className="py-1 pr-3">Time</th>
            <th scope="col" className="py-1 pr-3">Winding time</th>
            <th scope="col" className="py-1 pr-3">Counter</th>
            <th scope="col" className="py-1 pr-3">Height</th>
            <th scope="col" className="py-1 pr-3">Turns from height</th>
            <th scope="col" className="py-1 pr-3">Check</th>
          </tr>
        </thead>
        <tbody>
          {session.readings.map((r) => (
            <tr key={r.id} className="border-t border-rule" data-reading={r.id} data-flagged={r.flag ? 'true' : 'false'}>
              <td className="py-1 pr-3 tabular-nums">{clockText(r.at)}</td>
              <td className="py-1 pr-3 tabular-nums">{durationText(r.elapsed)}</td>
              <td className="py-1 pr-3 tabular-nums">{r.counter}</td>
              <td className="py-1 pr-3 tabular-nums">{r.height === null ? '—' : `${mmText(r.height)} ${r.datum ? DATUM_LABELS[r.datum] : ''}`}</td>
              <td className="py-1 pr-3 tabular-nums">{r.estimatedTurns === null ? '—' : `${r.estimatedTurns.toFixed(0)} ± ${r.tolerance!.toFixed(0)}`}</td>
              <td className="py-1 pr-3">{r.flag ? <span className="font-semibold text-fault">Disagrees: {r.flag.correctedCount} on the form</span> : r.estimatedTurns === null ? '' : 'Agrees'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
