import { memo } from 'react';
import type { Result } from '~/solver';
import { formatPercent, formatQuantity as q, lengthsInSystem, MISSING, type UnitSystem } from '~/lib/format';
import { fieldLabel } from '~/lib/design/labels';
import { SafetyNote } from '~/components/SafetyNote';
import type { DesignSI } from '~/solver';
import { figureOf, resultFigure, type ResultFigureId } from '~/lib/design/figures';
import { LEAD_FIGURES, RESULT_GROUPS, type ResultGroup } from '~/lib/design/figure-groups';
import { DrivePanel } from './DrivePanel';
import type { Calibration } from '~/lib/buildsheet/calibration';
import { FigureRow, Group } from './Row';
import { bandFigure, bandNote, FIGURE_DISPLAY } from './figure-display';
import { TapCallout } from './TapCallout';
import { FieldModelPanel } from './FieldModelPanel';

type Props = { result: Result; system: UnitSystem; stale?: boolean; calibration?: Calibration | null; design?: DesignSI | null };

/** A figure's row when the result has it: its registry label, its value, and the note the panel gives it. */
function GroupRow({ r, system, figure }: { r: Result; system: UnitSystem; figure: ResultFigureId }) {
  const f = resultFigure(figure);
  const d = FIGURE_DISPLAY[figure];
  const raw = f.get(r);
  const shown = d?.shown ? d.shown(r) : raw !== undefined && (figureOf(r, f) !== null || d?.value !== undefined);
  if (!shown) return null;
  const band = bandFigure(r) === figure ? bandNote(r) : null;
  const own = d?.note?.(r, system);
  const note = band || own ? <>{own}{own && band ? ' ' : null}{band}</> : undefined;
  return <FigureRow result={r} system={system} figure={figure} value={d?.value?.(r, system)} note={note} strong={d?.strong} />;
}

/**
 * Every result of the solver, led by the figures that decide the build and then grouped by what the builder
 * does with them (`RESULT_GROUPS`): what to buy, what to set, what to expect when measuring, what can hurt.
 */
export const ResultsPanel = memo(function ResultsPanel({ result: r, system, stale, calibration, design }: Props) {
  const band = r.uncertainty?.loadedFrequency;
  // a bridge-driven coil has no charged bank: its energy is per burst, in the drive panel
  const bridge = r.supply?.kind === 'solid-state';
  const lead = LEAD_FIGURES.filter((k) => k !== 'tapTurns' && !(bridge && k === 'tankEnergy'));
  return (
    <div className={`space-y-4 transition-opacity ${stale ? 'opacity-60' : ''}`} aria-busy={stale ? true : undefined} data-testid="results-panel">
      <TapCallout result={r} calibration={calibration ?? null} design={design ?? null} />

      {r.system && (
        <Group title="Decides the build" id="res-lead">
          <dl>
            {lead.map((k) => (
              <GroupRow key={k} r={r} system={system} figure={k} />
            ))}
          </dl>
        </Group>
      )}

      {RESULT_GROUPS.map((g) => (
        <ResultGroupSection key={g.key} group={g} r={r} system={system} />
      ))}

      {bridge && <DrivePanel result={r} system={system} />}

      <FieldModelPanel result={r} system={system} />

      {!bridge && r.tank && r.tank.energyAtSupplyPeak !== null && (
        <SafetyNote kind="stored-energy" className="mt-2">
          <p className="mt-1" data-safety-figure="stored-energy">
            This bank holds ½CV² = <strong>{q(r.tank.energyAtSupplyPeak, 'energy')}</strong> at the supply peak: potentially lethal.
          </p>
        </SafetyNote>
      )}
      {r.supply && !bridge && (
        <SafetyNote kind="supply" className="mt-2">
          <p className="mt-1" data-safety-figure="supply">
            This supply peaks at <strong>{q(r.supply.peakVoltage, 'voltage')}</strong>
            {r.supply.ratedPower !== null ? <> and can deliver {q(r.supply.ratedPower, 'power')}</> : null}.
          </p>
        </SafetyNote>
      )}

      {r.warnings.length > 0 && (
        <section className="cw-card" aria-labelledby="res-warnings">
          <h3 id="res-warnings" className="mb-2 text-base font-semibold">
            Points to check ({r.warnings.length})
          </h3>
          <ul className="list-disc space-y-1 pl-5 text-sm">
            {r.warnings.map((w) => (
              <li key={`${w.code}-${w.path}-${w.message}`}>
                <a href={`#${anchorFor(w.path)}`}>{fieldLabel(w.path)}</a>: {lengthsInSystem(w.message, system)}
              </li>
            ))}
          </ul>
        </section>
      )}
      {band && <p className="text-xs text-ink-soft">{r.uncertainty?.method} Frequency band ±{formatPercent((band.high - band.low) / 2 / band.nominal)} around the estimate.</p>}
      {!r.system && <p className="text-sm text-ink-soft">{MISSING}</p>}
    </div>
  );
});

function ResultGroupSection({ group, r, system }: { group: ResultGroup; r: Result; system: UnitSystem }) {
  const rows = group.figures.map((k) => <GroupRow key={k} r={r} system={system} figure={k} />);
  const id = `res-${group.key}`;
  return (
    <section className="cw-card" aria-labelledby={id} data-result-group={group.key}>
      <h3 id={id} className="text-base font-semibold">
        {group.title}
      </h3>
      <p className="mb-2 text-xs text-ink-soft">{group.purpose}</p>
      <dl>{rows}</dl>
    </section>
  );
}

/** The input a warning's path points at, or its part when the field is not on screen. */
function anchorFor(path: string): string {
  const part = path.split('.')[0] || 'secondary';
  const known = ['secondary', 'topload', 'primary', 'tank', 'supply', 'tuning'];
  return known.includes(part) ? `part-${part}` : 'part-secondary';
}
