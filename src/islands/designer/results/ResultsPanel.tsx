import { memo } from 'react';
import type { Result } from '~/solver';
import { formatFixed, formatPercent, formatQuantity as q, MISSING, type UnitSystem } from '~/lib/format';
import { SafetyNote } from '~/components/SafetyNote';
import { Group, Row } from './Row';
import { TapCallout } from './TapCallout';
import { FieldModelPanel } from './FieldModelPanel';

type Props = { result: Result; system: UnitSystem; stale?: boolean };

/** Every result of the solver, grouped the way a builder works through a coil. */
export const ResultsPanel = memo(function ResultsPanel({ result: r, system, stale }: Props) {
  const o = { system };
  const band = r.uncertainty?.loadedFrequency;
  const ratio = r.secondary && r.system ? r.secondary.resonantFrequency / r.system.quarterWaveFrequency : null;
  return (
    <div className={`space-y-4 transition-opacity ${stale ? 'opacity-60' : ''}`} aria-busy={stale ? true : undefined}>
      <TapCallout result={r} />

      {r.secondary && (
        <Group title="Secondary" id="res-secondary">
          <dl>
          <Row id="secondary.inductance" label="Inductance" value={q(r.secondary.inductance, 'inductance')} />
          <Row id="secondary.selfCapacitance" label="Self-capacitance (Medhurst)" value={q(r.secondary.selfCapacitance, 'capacitance')} />
          <Row id="secondary.resonantFrequency" label="Resonance without topload" value={q(r.secondary.resonantFrequency, 'frequency')} />
          <Row id="secondary.windingLength" label="Winding length" value={q(r.secondary.windingLength, 'length', o)} />
          <Row id="secondary.windingDiameter" label="Winding diameter (wire centres)" value={q(r.secondary.windingDiameter, 'length', o)} />
          <Row id="secondary.aspectRatio" label="Height : diameter" value={`${formatFixed(r.secondary.aspectRatio, 2)} : 1`} />
          <Row id="secondary.wireLength" label="Wire length" value={q(r.secondary.wireLength, 'wireLength', o)} />
          <Row id="secondary.dcResistance" label="DC resistance (20 °C)" value={q(r.secondary.dcResistance, 'resistance')} />
          <Row id="secondary.wireMass" label="Copper mass" value={q(r.secondary.wireMass, 'mass', o)} />
          {r.secondary.q !== null && <Row id="secondary.q" label="Q at the loaded frequency (upper bound)" value={formatFixed(r.secondary.q, 0)} />}
          </dl>
        </Group>
      )}

      {r.system && (
        <Group title="Topload and system frequency" id="res-system">
          <dl>
          {r.topload && <Row id="topload.capacitance" label="Topload capacitance" value={q(r.topload.capacitance, 'capacitance')} />}
          <Row
            id="system.resonantFrequency"
            label="Loaded resonant frequency"
            strong
            value={q(r.system.resonantFrequency, 'frequency')}
            note={band && !r.tuning ? <>Likely between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}{band.nominal !== r.system.resonantFrequency ? ' with the streamer allowance' : ''}: the models' stated accuracy.</> : undefined}
          />
          <Row id="system.totalCapacitance" label="Total capacitance (self + topload)" value={q(r.system.totalCapacitance, 'capacitance')} />
          <Row
            id="system.quarterWaveFrequency"
            label="Quarter-wave wire figure, c / (4 × wire length)"
            value={q(r.system.quarterWaveFrequency, 'frequency')}
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
              <Row
                id="tuning.targetFrequency"
                label="Tuning target (with streamer allowance)"
                value={q(r.tuning.targetFrequency, 'frequency')}
                note={band ? <>Likely between {q(band.low, 'frequency', { digits: 3 })} and {q(band.high, 'frequency', { digits: 3 })}: the models' stated accuracy.</> : undefined}
              />
              <Row id="tuning.tapTurns" label="Tap, turns from the inner end" value={r.tuning.tapTurns === null ? 'out of reach' : formatFixed(r.tuning.tapTurns, 2)} />
              <Row id="tuning.primaryFrequencyAllTurns" label="Primary + tank, every turn in circuit" value={q(r.tuning.primaryFrequencyAllTurns, 'frequency')} />
              <Row id="tuning.requiredInductance" label="Primary inductance needed at the tap" value={q(r.tuning.requiredInductance, 'inductance')} />
            </>
          )}
          {r.primary && (
            <>
              <Row id="primary.inductance" label="Primary inductance, all turns" value={q(r.primary.inductance, 'inductance')} />
              {r.primary.inductanceAtTap !== null && <Row id="primary.inductanceAtTap" label="Primary inductance at the tap" value={q(r.primary.inductanceAtTap, 'inductance')} />}
              <Row id="primary.conductorLength" label="Conductor length, all turns" value={q(r.primary.conductorLength, 'wireLength', o)} />
              {r.primary.conductorLengthAtTap !== null && <Row id="primary.conductorLengthAtTap" label="Conductor length to the tap" value={q(r.primary.conductorLengthAtTap, 'wireLength', o)} />}
              <Row id="primary.outerDiameter" label="Primary outside diameter" value={q(r.primary.outerDiameter, 'length', o)} />
            </>
          )}
          </dl>
        </Group>
      )}

      {r.coupling && (
        <Group title="Coupling" id="res-coupling">
          <dl>
          <Row id="coupling.k" label="Coupling coefficient k, all turns" strong value={formatFixed(r.coupling.k, 3)} />
          {r.coupling.kAtTap !== null && <Row id="coupling.kAtTap" label="k with the turns up to the tap" value={formatFixed(r.coupling.kAtTap, 3)} />}
          <Row id="coupling.mutualInductance" label="Mutual inductance" value={q(r.coupling.mutualInductance, 'inductance')} />
          {r.coupling.elevationForTargetCoupling !== null && (
            <Row id="coupling.elevationForTargetCoupling" label="Secondary elevation for the target k" value={q(r.coupling.elevationForTargetCoupling, 'length', o)} />
          )}
          {r.response && (
            <>
              <Row id="response.fLow" label="Lower split frequency" value={q(r.response.fLow, 'frequency')} />
              <Row id="response.fHigh" label="Upper split frequency" value={q(r.response.fHigh, 'frequency')} />
              <Row
                id="response.transferTime"
                label="Energy moves to the secondary in"
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
              <Row id="tank.capacitance" label="Tank capacitance" value={q(r.tank.capacitance, 'capacitance')} />
              {r.tank.voltageRating !== null && <Row id="tank.voltageRating" label="Bank voltage rating" value={q(r.tank.voltageRating, 'voltage')} />}
              {r.tank.perUnitVoltage !== null && <Row id="tank.perUnitVoltage" label="Voltage across each capacitor at the supply peak" value={q(r.tank.perUnitVoltage, 'voltage')} />}
              {r.tank.ratingMargin !== null && <Row id="tank.ratingMargin" label="Rating over supply peak" value={`${formatFixed(r.tank.ratingMargin, 2)}×`} />}
              <Row id="tank.energyAtSupplyPeak" label="Stored energy at the supply peak, ½CV²" strong value={r.tank.energyAtSupplyPeak === null ? 'add a supply' : q(r.tank.energyAtSupplyPeak, 'energy')} />
              {r.tank.bleeder && (
                <Row
                  id="tank.bleeder"
                  label="Bleeder across each capacitor"
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
              <Row id="supply.peakVoltage" label="Supply peak voltage" value={q(r.supply.peakVoltage, 'voltage')} />
              {r.supply.ratedPower !== null && <Row id="supply.ratedPower" label="Rated power" value={q(r.supply.ratedPower, 'power')} />}
              {r.supply.resonantCapacitance !== null && <Row id="supply.resonantCapacitance" label="Capacitance resonant with the transformer" value={q(r.supply.resonantCapacitance, 'capacitance')} />}
              {r.supply.ltrCapacitance !== null && <Row id="supply.ltrCapacitance" label="Larger-than-resonant value, 1 / (4 f Z)" value={q(r.supply.ltrCapacitance, 'capacitance')} />}
              {r.supply.tankToResonantRatio !== null && <Row id="supply.tankToResonantRatio" label="Tank over resonant capacitance" value={`${formatFixed(r.supply.tankToResonantRatio, 2)}×`} />}
              {r.supply.energyPerBang !== null && <Row id="supply.energyPerBang" label="Energy per firing" value={q(r.supply.energyPerBang, 'energy')} />}
              {r.supply.powerAtBreakRate !== null && <Row id="supply.powerAtBreakRate" label="Power at the break rate" value={q(r.supply.powerAtBreakRate, 'power')} />}
              {r.supply.sparkLengthEstimate !== null && (
                <Row id="supply.sparkLengthEstimate" label="Spark length, rough rule of thumb" value={q(r.supply.sparkLengthEstimate, 'length', o)}
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
                <a href={`#${anchorFor(w.path)}`}>{w.path || 'design'}</a>: {w.message}
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
