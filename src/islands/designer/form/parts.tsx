import { memo } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { UnitSystem } from '~/lib/format';
import type { FormValues } from './values';
import { Field } from './Field';
import { SelectField } from './SelectField';
import { Part } from './Part';
import { AwgPicker } from './AwgPicker';
import { fieldId, useFieldFeedback } from './field-context';

type PartProps = { system: UnitSystem };

const lengthHint = (system: UnitSystem, example: string, exampleMetric: string) =>
  `A length with its unit, e.g. ${system === 'imperial' ? example : exampleMetric}`;

export const SecondaryPart = memo(function SecondaryPart({ system }: PartProps) {
  const mode = useWatch<FormValues, 'secondary.wireMode'>({ name: 'secondary.wireMode' });
  return (
    <Part id="part-secondary" title="Secondary" ownPaths={['secondary', 'secondary.wire']}>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field path="secondary.formDiameter" label="Form outer diameter" hint={lengthHint(system, '4.5 in', '114 mm')} />
        <Field path="secondary.turns" label="Secondary turns" inputMode="numeric" hint="Whole turns of the winding" />
      </div>
      <SelectField
        path="secondary.wireMode"
        label="Wire given by"
        options={[
          { value: 'awg', label: 'Gauge (AWG) and enamel' },
          { value: 'diameter', label: 'Measured diameters' },
        ]}
      />
      {mode === 'awg' ? (
        <AwgPicker system={system} />
      ) : (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="secondary.wire.diameter" label="Bare wire diameter" hint={lengthHint(system, '0.0201 in', '0.51 mm')} />
          <Field path="secondary.wire.insulatedDiameter" label="Insulated wire diameter" hint="Over the enamel: the pitch when close-wound" />
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field path="secondary.windingLength" label="Winding length" hint="Leave empty for close-wound (turns × insulated diameter)" />
        <Field path="secondary.elevation" label="Winding bottom above primary plane" hint="Height of the first turn above z = 0" />
      </div>
      <Field path="groundClearance" label="Primary plane above the floor" hint="Height of z = 0 over the ground plane; empty for 0.5 m" />
    </Part>
  );
});

export const ToploadPart = memo(function ToploadPart({ system }: PartProps) {
  const shape = useWatch<FormValues, 'topload.shape'>({ name: 'topload.shape' });
  return (
    <Part id="part-topload" title="Topload" ownPaths={['topload']}>
      <SelectField
        path="topload.shape"
        label="Topload shape"
        options={[
          { value: 'none', label: 'None' },
          { value: 'toroid', label: 'Toroid' },
          { value: 'sphere', label: 'Sphere' },
        ]}
      />
      {shape === 'toroid' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="topload.majorDiameter" label="Toroid overall diameter" hint={lengthHint(system, '20 in', '500 mm')} />
          <Field path="topload.minorDiameter" label="Toroid tube diameter" hint="Diameter of the tube's cross-section" />
        </div>
      )}
      {shape === 'sphere' && <Field path="topload.diameter" label="Sphere diameter" hint={lengthHint(system, '12 in', '300 mm')} />}
      {shape !== 'none' && <Field path="topload.elevation" label="Topload centre above winding top" hint="From the top turn to the topload's centre" />}
    </Part>
  );
});

export const PrimaryPart = memo(function PrimaryPart({ system }: PartProps) {
  const { register } = useFormContext<FormValues>();
  const { readOnly } = useFieldFeedback();
  const enabled = useWatch<FormValues, 'primary.enabled'>({ name: 'primary.enabled' });
  const shape = useWatch<FormValues, 'primary.shape'>({ name: 'primary.shape' });
  return (
    <Part
      id="part-primary"
      title="Primary"
      ownPaths={['primary']}
      action={
        <label className="flex items-center gap-2 text-sm font-normal">
          <input type="checkbox" id={fieldId('primary.enabled')} className="h-4 w-4 accent-copper" disabled={readOnly} {...register('primary.enabled')} />
          Include a primary
        </label>
      }
    >
      {enabled && (
        <>
          <div className="grid gap-3 sm:grid-cols-2">
            <SelectField
              path="primary.shape"
              label="Primary shape"
              options={[
                { value: 'flat', label: 'Flat spiral' },
                { value: 'helical', label: 'Helical' },
                { value: 'conical', label: 'Conical' },
              ]}
            />
            <Field path="primary.turns" label="Primary turns" inputMode="decimal" hint="Fractions allowed, e.g. 11.5" />
            <Field path="primary.innerDiameter" label="Innermost turn diameter" hint="Centre-line diameter of the first turn" />
            <Field path="primary.conductorDiameter" label="Conductor diameter" hint={lengthHint(system, '0.25 in', '6 mm')} />
            <Field path="primary.spacing" label="Gap between turns" hint="Between conductor surfaces" />
            <Field path="primary.elevation" label="Innermost turn above primary plane" hint="Usually 0: the primary defines z = 0" />
          </div>
          {shape === 'conical' && <Field path="primary.angle" label="Cone angle above horizontal" hint='An angle, e.g. "30 deg"' />}
        </>
      )}
    </Part>
  );
});

export const TankPart = memo(function TankPart() {
  const mode = useWatch<FormValues, 'tank.mode'>({ name: 'tank.mode' });
  return (
    <Part id="part-tank" title="Tank capacitor" ownPaths={['tank']}>
      <SelectField
        path="tank.mode"
        label="Tank capacitor"
        options={[
          { value: 'none', label: 'None yet' },
          { value: 'single', label: 'One capacitance' },
          { value: 'bank', label: 'Bank of equal capacitors (MMC)' },
        ]}
      />
      {mode === 'single' && <Field path="tank.capacitance" label="Tank capacitance" hint='e.g. "20 nF"' />}
      {mode === 'bank' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="tank.unitCapacitance" label="Capacitance of each capacitor" hint='e.g. "150 nF"' />
          <Field path="tank.unitVoltage" label="DC rating of each capacitor" hint='e.g. "2 kV"' />
          <Field path="tank.series" label="Capacitors in each string" inputMode="numeric" />
          <Field path="tank.parallel" label="Strings in parallel" inputMode="numeric" />
        </div>
      )}
    </Part>
  );
});

export const SupplyPart = memo(function SupplyPart() {
  const kind = useWatch<FormValues, 'supply.kind'>({ name: 'supply.kind' });
  return (
    <Part id="part-supply" title="Supply" ownPaths={['supply']}>
      <SelectField
        path="supply.kind"
        label="Supply"
        options={[
          { value: 'none', label: 'None yet' },
          { value: 'transformer', label: 'Transformer (sign or neon transformer)' },
          { value: 'solid-state', label: 'Solid-state bridge (DC bus)' },
        ]}
      />
      {kind === 'transformer' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="supply.voltage" label="Output voltage (RMS)" hint='e.g. "12 kV"' />
          <Field path="supply.current" label="Rated output current (RMS)" hint='e.g. "30 mA"' />
          <Field path="supply.lineFrequency" label="Mains frequency" hint='"50 Hz" or "60 Hz"' />
          <Field path="supply.breakRate" label="Gap firings per second" hint='e.g. "120 Hz"; empty for twice the mains frequency' />
        </div>
      )}
      {kind === 'solid-state' && <Field path="supply.busVoltage" label="DC bus voltage" hint='e.g. "340 V"' />}
    </Part>
  );
});

export const TuningPart = memo(function TuningPart({ system }: PartProps) {
  const mode = useWatch<FormValues, 'tuning.streamerMode'>({ name: 'tuning.streamerMode' });
  return (
    <Part id="part-tuning" title="Tuning" ownPaths={['tuning']}>
      <SelectField
        path="tuning.streamerMode"
        label="Streamer allowance given as"
        options={[
          { value: 'capacitance', label: 'A capacitance' },
          { value: 'length', label: 'The expected spark length (1 pF per foot)' },
        ]}
      />
      {mode === 'capacitance' ? (
        <Field path="tuning.streamerCapacitance" label="Streamer capacitance allowance" hint='e.g. "3 pF"; empty for none' />
      ) : (
        <Field path="tuning.streamerLength" label="Expected streamer length" hint={lengthHint(system, '24 in', '600 mm')} />
      )}
      <Field path="tuning.targetCoupling" label="Target coupling k" inputMode="decimal" hint="e.g. 0.15; the results give the secondary elevation for it" />
    </Part>
  );
});
