import { memo, useDeferredValue } from 'react';
import type { Result } from '~/solver';
import { formatFixed, formatQuantity as q, type UnitSystem } from '~/lib/format';
import VoltageProfileChart from '../../charts/VoltageProfileChart';
import { Group, Row } from './Row';


type Props = { result: Result; system: UnitSystem };

const NO_PROFILE: ReadonlyArray<{ height: number; voltage: number }> = [];

/** The whole-resonator field model: lumped against field frequency, the shielding, the modes and the voltage along the winding. */
export const FieldModelPanel = memo(function FieldModelPanel({ result: r, system }: Props) {
  const s = r.system;
  // the figures update with the result; the chart of the voltage along the winding follows in a render of its own
  const profile = useDeferredValue(s?.voltageProfile ?? NO_PROFILE);
  if (!s || s.voltageProfile.length === 0) return null;
  const shift = s.resonantFrequency / s.lumpedResonantFrequency - 1;
  const interaction = s.fieldCapacitance.interaction;
  const pF = (c: number) => `${c < 0 ? '−' : ''}${formatFixed(Math.abs(c) * 1e12, 1)} pF`;
  return (
    <Group title="Whole resonator (field model)" id="res-field">
      <dl>
        <Row id="system.resonantFrequency.field" label="Loaded frequency, field model" strong value={q(s.resonantFrequency, 'frequency')} />
        <Row
          id="system.lumpedResonantFrequency"
          label="Lumped estimate (Medhurst + topload alone)"
          value={q(s.lumpedResonantFrequency, 'frequency')}
          note={
            <>
              The field model is {formatFixed(Math.abs(shift) * 100, 1)} % {shift >= 0 ? 'higher' : 'lower'}: solved together, the winding and the
              topload shield each other, and the winding sits on a {s.former.assumed ? 'thin pipe (assumed PVC)' : 'former'} rather than on the solid
              rods Medhurst measured, so the structure holds less capacitance than the parts added up.
            </>
          }
        />
        {r.topload && (
          <Row
            id="system.fieldCapacitance.interaction"
            label="Shielding between coil and topload"
            value={pF(interaction)}
            note={
              <>
                Together {pF(s.fieldCapacitance.structure)}; apart, coil {pF(s.fieldCapacitance.coilAlone)} + topload {pF(s.fieldCapacitance.toploadAlone)} (straight-line voltage along the winding).
              </>
            }
          />
        )}
        <Row id="system.modes" label="First three modes" value={s.modes.map((f) => q(f, 'frequency', { digits: 3 })).join(', ')} />
        <Row id="system.effectiveCapacitance" label="Equivalent capacitance at the top" value={q(s.effectiveCapacitance, 'capacitance')} />
        <Row id="system.effectiveInductance" label="Equivalent inductance at the top" value={q(s.effectiveInductance, 'inductance')} />
        <Row
          id="system.former"
          label="Coil form dielectric"
          value={`εr ${formatFixed(s.former.permittivity, 2)}, wall ${q(s.former.wallThickness, 'length', { system })}`}
          note={s.former.assumed ? 'Assumed: a thin-walled PVC pipe. Give the form’s material and wall to refine it.' : undefined}
        />
      </dl>
      <VoltageProfileChart profile={profile.length > 0 ? profile : s.voltageProfile} system={system} />
    </Group>
  );
});
