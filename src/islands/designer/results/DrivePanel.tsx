import type { Result } from '~/solver';
import { formatFixed, formatPercent, formatQuantity as q, type UnitSystem } from '~/lib/format';
import { SafetyNote } from '~/components/SafetyNote';
import { FigureRow, Group } from './Row';

type Props = { result: Result; system: UnitSystem };

/** The bridge-driven coil's burst: what the switches, the tank, the bank and the bus go through. */
export function DrivePanel({ result: r, system }: Props) {
  const d = r.drive;
  if (!d) {
    return (
      <Group title="Drive (burst)" id="res-drive">
        <p className="text-sm text-ink-soft">
          {d === null && r.primary === null
            ? 'The burst needs a primary.'
            : 'The burst needs a primary and, for a dual-resonant coil, a tank capacitor with a tap within reach.'}
        </p>
        <SafetyNote kind="bus" className="mt-2" />
      </Group>
    );
  }
  const dual = d.topology === 'dual-resonant';
  const limit = d.limitBy === 'switchPeakCurrent' ? 'switch rating' : 'trip';
  const ratio = (x: number | null) => (x === null ? '—' : `${formatFixed(x, 2)}×`);
  return (
    <Group title="Drive (burst)" id="res-drive">
      <p className="mb-2 text-xs text-ink-soft">
        {dual ? 'Dual-resonant' : 'Single-resonant'}, {d.bridge} bridge, {q(d.onTime, 'time', { digits: 3 })} bursts at {q(d.repetitionRate, 'frequency', { digits: 3 })}:
        the primary and secondary integrated through one burst from rest, the bridge switching at the primary current&apos;s zero crossings.
      </p>
      <dl>
        {d.surgeImpedance !== null && <FigureRow result={r} system={system} figure="surgeImpedance" />}
        <FigureRow result={r} system={system} figure="drivePrimaryFrequency" />
        {d.frequencyRatio !== null && <FigureRow result={r} system={system} figure="driveFrequencyRatio" value={formatFixed(d.frequencyRatio, 3)} />}
        <FigureRow
          result={r}
          system={system}
          figure="peakPrimaryCurrent"
          strong
          note={
            d.switchPeakCurrent !== null
              ? <>The switches are rated {q(d.switchPeakCurrent, 'current', { digits: 3 })} pulsed ({ratio(d.switchPeakCurrent / d.peakPrimaryCurrent)} this peak).</>
              : 'Give the switches\u2019 pulsed rating to have it checked.'
          }
        />
        <FigureRow
          result={r}
          system={system}
          figure="timeToCurrentLimit"
          value={d.timeToCurrentLimit === null ? (d.currentLimit === null && d.switchPeakCurrent === null ? 'no limit given' : 'not reached in the on-time') : q(d.timeToCurrentLimit, 'time', { digits: 3 })}
          note={d.timeToCurrentLimit !== null ? <>The {limit} is reached before the on-time ends: the controller would cut the burst short there; the figures here run on to the full on-time. Shorten the on-time.</> : undefined}
        />
        {dual && (
          <>
            <FigureRow result={r} system={system} figure="capacitorPeakVoltage" strong />
            <FigureRow result={r} system={system} figure="capacitorRmsCurrent" />
          </>
        )}
        {d.bank && (
          <>
            <FigureRow
              result={r}
              system={system}
              figure="unitPeakVoltage"
              note={<>{d.bank.series} in each string, {d.bank.parallel} strings; each rated {q(d.bank.unitVoltage, 'voltage', { digits: 3 })} ({ratio(d.bank.voltageMargin)} its peak).</>}
            />
            <FigureRow
              result={r}
              system={system}
              figure="stringRmsCurrent"
              note={d.bank.currentMargin === null ? 'Give the capacitors\u2019 RMS current rating to have it checked.' : <>Each rated {q(d.bank.unitRmsCurrent, 'current', { digits: 3 })} RMS ({ratio(d.bank.currentMargin)} its current).</>}
            />
          </>
        )}
        <FigureRow result={r} system={system} figure="secondaryPeakVoltage" note="An upper bound: the unloaded secondary, no streamer loss." />
        {!dual && <FigureRow result={r} system={system} figure="baseCurrentPeak" />}
        <FigureRow result={r} system={system} figure="burstEnergy" />
        <FigureRow result={r} system={system} figure="averagePower" />
        <FigureRow result={r} system={system} figure="dutyCycle" value={formatPercent(d.dutyCycle)} />
        <FigureRow
          result={r}
          system={system}
          figure="busDroop"
          value={d.busDroop === null ? 'give the bus capacitance' : `${q(d.busDroop, 'voltage', { digits: 3 })} (${formatPercent(d.busDroop / d.busVoltage)})`}
        />
      </dl>
      {dual && d.capacitorPeakEnergy !== null && (
        <SafetyNote kind="stored-energy" className="mt-2">
          <p className="mt-1" data-safety-figure="tank-burst">
            The tank rings to <strong>{q(d.capacitorPeakVoltage, 'voltage')}</strong> in each burst, holding up to ½CV² ={' '}
            <strong>{q(d.capacitorPeakEnergy, 'energy')}</strong>.
          </p>
        </SafetyNote>
      )}
      <SafetyNote kind="bus" className="mt-2">
        <p className="mt-1" data-safety-figure="bus">
          This bus sits at <strong>{q(d.busVoltage, 'voltage')}</strong> from the mains
          {d.busEnergy !== null ? <>; its capacitors hold <strong>{q(d.busEnergy, 'energy')}</strong> after switch-off</> : null}: potentially lethal.
        </p>
      </SafetyNote>
    </Group>
  );
}
