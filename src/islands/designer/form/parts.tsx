import { memo } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { UnitSystem } from '~/lib/format';
import type { FormValues } from './values';
import { Field } from './Field';
import { SelectField } from './SelectField';
import { Part } from './Part';
import { AwgPicker } from './AwgPicker';
import { fieldId, useFieldReadOnly } from './field-context';
import { DESIGN_PARTS, findDesignField } from '~/lib/design/registry';

type PartProps = { system: UnitSystem };

const title = (key: (typeof DESIGN_PARTS)[number]['key']) => DESIGN_PARTS.find((p) => p.key === key)!.title;

export const SecondaryPart = memo(function SecondaryPart({ system }: PartProps) {
  const mode = useWatch<FormValues, 'secondary.wireMode'>({ name: 'secondary.wireMode' });
  return (
    <Part id="part-secondary" title={title('secondary')} ownPaths={['secondary', 'secondary.wire']}>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field path="secondary.formDiameter" system={system} />
        <Field path="secondary.turns" system={system} />
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
          <Field path="secondary.wire.diameter" system={system} />
          <Field path="secondary.wire.insulatedDiameter" system={system} />
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field path="secondary.windingLength" system={system} />
        <Field path="secondary.elevation" system={system} />
      </div>
      <Field path="groundClearance" system={system} />
      <SelectField path="secondary.former.material" options={[{ value: '', label: 'Not given: thin PVC pipe assumed' }, ...(findDesignField('secondary.former.material')?.options ?? [])]} />
      <Field path="secondary.former.permittivity" system={system} />
      <Field path="secondary.former.wallThickness" system={system} />
      <Field path="strikeRail.diameter" system={system} />
      <Field path="strikeRail.height" system={system} />
      <Field path="strikeRail.conductorDiameter" system={system} />
    </Part>
  );
});

export const ToploadPart = memo(function ToploadPart({ system }: PartProps) {
  const shape = useWatch<FormValues, 'topload.shape'>({ name: 'topload.shape' });
  return (
    <Part id="part-topload" title={title('topload')} ownPaths={['topload']}>
      <SelectField path="topload.shape" none="None" />
      {shape === 'toroid' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="topload.majorDiameter" system={system} />
          <Field path="topload.minorDiameter" system={system} />
        </div>
      )}
      {shape === 'sphere' && <Field path="topload.diameter" system={system} />}
      {shape !== 'none' && <Field path="topload.elevation" system={system} />}
    </Part>
  );
});

export const PrimaryPart = memo(function PrimaryPart({ system }: PartProps) {
  const { register } = useFormContext<FormValues>();
  const readOnly = useFieldReadOnly();
  const enabled = useWatch<FormValues, 'primary.enabled'>({ name: 'primary.enabled' });
  const shape = useWatch<FormValues, 'primary.shape'>({ name: 'primary.shape' });
  return (
    <Part
      id="part-primary"
      title={title('primary')}
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
            <SelectField path="primary.shape" />
            <Field path="primary.turns" system={system} />
            <Field path="primary.innerDiameter" system={system} />
            <Field path="primary.conductorDiameter" system={system} />
            <Field path="primary.spacing" system={system} />
            <Field path="primary.elevation" system={system} />
          </div>
          {shape === 'conical' && <Field path="primary.angle" system={system} />}
        </>
      )}
    </Part>
  );
});

export const TankPart = memo(function TankPart() {
  const mode = useWatch<FormValues, 'tank.mode'>({ name: 'tank.mode' });
  return (
    <Part id="part-tank" title={title('tank')} ownPaths={['tank']}>
      <SelectField
        path="tank.mode"
        label={title('tank')}
        options={[
          { value: 'none', label: 'None yet' },
          { value: 'single', label: 'One capacitance' },
          { value: 'bank', label: 'Bank of equal capacitors (MMC)' },
        ]}
      />
      {mode === 'single' && <Field path="tank.capacitance" />}
      {mode === 'bank' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="tank.unitCapacitance" />
          <Field path="tank.unitVoltage" />
          <Field path="tank.series" />
          <Field path="tank.parallel" />
          <Field path="tank.unitRmsCurrent" />
        </div>
      )}
    </Part>
  );
});

export const SupplyPart = memo(function SupplyPart() {
  const kind = useWatch<FormValues, 'supply.kind'>({ name: 'supply.kind' });
  const topology = useWatch<FormValues, 'supply.topology'>({ name: 'supply.topology' });
  return (
    <Part id="part-supply" title={title('supply')} ownPaths={['supply']}>
      <SelectField path="supply.kind" none="None yet" />
      {kind === 'transformer' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field path="supply.voltage" />
          <Field path="supply.current" />
          <Field path="supply.lineFrequency" />
          <Field path="supply.breakRate" />
        </div>
      )}
      {kind === 'solid-state' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField path="supply.topology" />
          <SelectField path="supply.bridge" />
          <Field path="supply.busVoltage" />
          <Field path="supply.busCapacitance" />
          <Field path="supply.onTime" />
          <Field path="supply.repetitionRate" />
          <Field path="supply.currentLimit" />
          <Field path="supply.switchPeakCurrent" />
          {topology !== 'single-resonant' && <Field path="supply.tuningRatio" />}
        </div>
      )}
    </Part>
  );
});

export const TuningPart = memo(function TuningPart({ system }: PartProps) {
  const mode = useWatch<FormValues, 'tuning.streamerMode'>({ name: 'tuning.streamerMode' });
  return (
    <Part id="part-tuning" title={title('tuning')} ownPaths={['tuning']}>
      <SelectField
        path="tuning.streamerMode"
        label="Streamer allowance given as"
        options={[
          { value: 'capacitance', label: 'A capacitance' },
          { value: 'length', label: 'The expected spark length (1 pF per foot)' },
        ]}
      />
      {mode === 'capacitance' ? (
        <Field path="tuning.streamerCapacitance" system={system} />
      ) : (
        <Field path="tuning.streamerLength" system={system} />
      )}
      <Field path="tuning.targetCoupling" system={system} />
    </Part>
  );
});
