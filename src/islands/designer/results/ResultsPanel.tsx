import { memo } from 'react';
import type { Result } from '~/solver';
import { formatFixed, formatPercent, formatQuantity as q, lengthsInSystem, MISSING, type UnitSystem } from '~/lib/format';
import { fieldLabel } from '~/lib/design/labels';
import { SafetyNote } from '~/components/SafetyNote';
import { FigureRow, Group } from './Row';
import { TapCallout } from './TapCallout';
import { FieldModelPanel } from './FieldModelPanel';

type Props = { result: Result; system: UnitSystem; stale?: boolean };

/** Every result of the solver, grouped the way a builder works through a coil. */
export const ResultsPanel = memo(function ResultsPanel({ result: r, system, stale }: Props) {
  const band = r.uncertainty?.loadedFrequency;
  const ratio = r.secondary && r.system ? r.secondary.resonantFrequency / r.system.quarterWaveFrequency : null;
  return (
    <div className={`space-y-4 transition-opacity ${stale ? 'opacity-60' : ''}`} aria-busy={stale ? true : undefined}>
      <TapCallout result={r} />

      {r.secondary && (
        <Group title="Secondary" id="res-secondary">
          <dl>
          <FigureRow result={r} system={system} figure="secondaryInductance" />
          <FigureRow result={r} system={system} figure="selfCapacitance" />
          <FigureRow result={r} system={system} figure="secondaryFrequency" />
          <FigureRow result={r} system={system} figure="windingLength" />
          <FigureRow result={r} system={system} figure="windingDiameter" />
          <FigureRow result={r} system={system} figure="aspectRatio" value={`${formatFixed(r.secondary.aspectRatio, 2)} : 1`} />
          <FigureRow result={r} system={system} figure="wireLength" />
          <FigureRow result={r} system={system} figure="dcResistance" />
          <FigureRow result={r} system={system} figure="wireMass" />
          {r.secondary.q !== null && <FigureRow result={r} system={system} figure="secondaryQ" value={formatFixed(r.secondary.q, 0)} />}
          </dl>
        </Group>
      )}

      {r.system && (
        <Group title="Topload and system frequency" id="res-system">
          <dl>
          {r.topload && <FigureRow result={r} system={system} figure="toploadCapacitance" />}
          <FigureRow result={r} system={system} figure="loadedFrequency"
            strong
            note={band && !r.tuning ? <>Likely between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}{band.nominal !== r.system.resonantFrequency ? ' with the streamer allowance' : ''}: the models' stated accuracy.</> : undefined}
          />
          <FigureRow result={r} system={system} figure="totalCapacitance" />
          <FigureRow result={r} system={system} figure="quarterWaveFrequency"
            note={
              <>
                For comparison only: a wound coil resonates well above the straight-wire quarter wave
                {ratio !== null ? <> (here {formatFixed(ratio, 2)}× for the bare coil)</> : null}, because winding the wire into a solenoid changes the wave speed along it.
              </>
            }
          />
          </dl>
        </Group>
      )}

      <FieldModelPanel result={r} system={system} />

      {(r.primary || r.tuning) && (
        <Group title="Primary and tap" id="res-primary">
          <dl>
          {r.tuning && (
            <>
              <FigureRow
                result={r}
                system={system}
                figure="targetFrequency"
                note={band ? <>Likely between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}: the models' stated accuracy.</> : undefined}
              />
              <FigureRow result={r} system={system} figure="tapTurns" value={r.tuning.tapTurns === null ? 'out of reach' : formatFixed(r.tuning.tapTurns, 2)} />
              <FigureRow result={r} system={system} figure="primaryFrequencyAllTurns" />
              <FigureRow result={r} system={system} figure="requiredInductance" />
            </>
          )}
          {r.primary && (
            <>
              <FigureRow result={r} system={system} figure="primaryInductance" />
              {r.primary.inductanceAtTap !== null && <FigureRow result={r} system={system} figure="primaryInductanceAtTap" />}
              <FigureRow result={r} system={system} figure="conductorLength" />
              {r.primary.conductorLengthAtTap !== null && <FigureRow result={r} system={system} figure="conductorLengthAtTap" />}
              <FigureRow result={r} system={system} figure="primaryOuterDiameter" />
            </>
          )}
          </dl>
        </Group>
      )}

      {r.coupling && (
        <Group title="Coupling" id="res-coupling">
          <dl>
          <FigureRow result={r} system={system} figure="k" strong value={formatFixed(r.coupling.k, 3)} />
          {r.coupling.kAtTap !== null && <FigureRow result={r} system={system} figure="kAtTap" value={formatFixed(r.coupling.kAtTap, 3)} />}
          <FigureRow result={r} system={system} figure="mutualInductance" />
          {r.coupling.elevationForTargetCoupling !== null && (
            <FigureRow result={r} system={system} figure="elevationForTargetCoupling" />
          )}
          {r.response && (
            <>
              <FigureRow result={r} system={system} figure="fLow" />
              <FigureRow result={r} system={system} figure="fHigh" />
              <FigureRow result={r} system={system} figure="transferTime"
                value={q(r.response.firstPrimaryMinimum ?? r.response.transferTime, 'time')}
                note={<>About {formatFixed(r.response.halfCyclesToTransfer, 1)} half-cycles; lossless estimate.</>}
              />
            </>
          )}
          </dl>
        </Group>
      )}

      {(r.tank || r.supply) && (
        <Group title="Tank and supply" id="res-tank">
          {r.tank && (
            <>
              <dl>
              <FigureRow result={r} system={system} figure="tankCapacitance" />
              {r.tank.voltageRating !== null && <FigureRow result={r} system={system} figure="tankVoltageRating" />}
              {r.tank.perUnitVoltage !== null && <FigureRow result={r} system={system} figure="perUnitVoltage" />}
              {r.tank.ratingMargin !== null && <FigureRow result={r} system={system} figure="ratingMargin" value={`${formatFixed(r.tank.ratingMargin, 2)}×`} />}
              <FigureRow result={r} system={system} figure="tankEnergy" strong value={r.tank.energyAtSupplyPeak === null ? 'add a supply' : q(r.tank.energyAtSupplyPeak, 'energy')} />
              {r.tank.bleeder && (
                <FigureRow result={r} system={system} figure="bleeder"
                  value={`${q(r.tank.bleeder.resistancePerUnit, 'resistance', { digits: 2 })}, ${q(r.tank.bleeder.powerPerUnit, 'power', { digits: 2 })}`}
                  note={<>{r.tank.bleeder.count} resistors; the bank falls to about 1 % in {q(4.6 * r.tank.bleeder.timeConstant, 'time', { digits: 2 })}.</>}
                />
              )}
              </dl>
              <SafetyNote kind="stored-energy" className="mt-2">
                {r.tank.energyAtSupplyPeak !== null && (
                  <p className="mt-1" data-safety-figure="stored-energy">
                    This bank holds ½CV² = <strong>{q(r.tank.energyAtSupplyPeak, 'energy')}</strong> at the supply peak: potentially lethal.
                  </p>
                )}
              </SafetyNote>
            </>
          )}
          {r.supply && (
            <div className="mt-3">
              <dl>
              <FigureRow result={r} system={system} figure="peakVoltage" />
              {r.supply.ratedPower !== null && <FigureRow result={r} system={system} figure="ratedPower" />}
              {r.supply.resonantCapacitance !== null && <FigureRow result={r} system={system} figure="resonantCapacitance" />}
              {r.supply.ltrCapacitance !== null && <FigureRow result={r} system={system} figure="ltrCapacitance" />}
              {r.supply.tankToResonantRatio !== null && <FigureRow result={r} system={system} figure="tankToResonantRatio" value={`${formatFixed(r.supply.tankToResonantRatio, 2)}×`} />}
              {r.supply.energyPerBang !== null && <FigureRow result={r} system={system} figure="energyPerBang" />}
              {r.supply.powerAtBreakRate !== null && <FigureRow result={r} system={system} figure="powerAtBreakRate" />}
              {r.supply.sparkLengthEstimate !== null && (
                <FigureRow result={r} system={system} figure="sparkLengthEstimate"
                  note={r.supply.sparkLengthNote ?? undefined}
                />
              )}
              </dl>
              <SafetyNote kind="supply" className="mt-2">
                <p className="mt-1" data-safety-figure="supply">
                  This supply peaks at <strong>{q(r.supply.peakVoltage, 'voltage')}</strong>
                  {r.supply.ratedPower !== null ? <> and can deliver {q(r.supply.ratedPower, 'power')}</> : null}.
                </p>
              </SafetyNote>
            </div>
          )}
        </Group>
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

/** The input a warning's path points at, or its part when the field is not on screen. */
function anchorFor(path: string): string {
  const part = path.split('.')[0] || 'secondary';
  const known = ['secondary', 'topload', 'primary', 'tank', 'supply', 'tuning'];
  return known.includes(part) ? `part-${part}` : 'part-secondary';
}
