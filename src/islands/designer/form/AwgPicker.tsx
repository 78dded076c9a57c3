import { useFormContext, useWatch } from 'react-hook-form';
import { AWG_MAX, AWG_MIN, awgDiameter } from '~/solver/wire/awg';
import { insulatedDiameterAwg, INSULATION_SOURCE } from '~/solver/wire/insulation';
import { formatLength, type UnitSystem } from '~/lib/format';
import { designField } from '~/lib/design/registry';
import type { FormValues } from './values';
import { fieldId, useFieldError, useFieldReadOnly } from './field-context';
import { SelectField } from './SelectField';
import { FieldWarnings } from './FieldWarnings';

const GAUGES = Array.from({ length: 41 - 10 + 1 }, (_, i) => 10 + i);
function gaugeLabel(n: number): string {
  return n <= 0 ? `${'0'.repeat(1 - n)}` : String(n);
}

/** Magnet-wire gauge and enamel build, with the bare and insulated diameters they give (ASTM B258 + film build). */
export function AwgPicker({ system }: { system: UnitSystem }) {
  const { register } = useFormContext<FormValues>();
  const readOnly = useFieldReadOnly();
  const awgText = useWatch<FormValues, 'secondary.wire.awg'>({ name: 'secondary.wire.awg' });
  const insulation = useWatch<FormValues, 'secondary.wire.insulation'>({ name: 'secondary.wire.insulation' });
  const awg = Number(awgText);
  const valid = Number.isInteger(awg) && awg >= AWG_MIN && awg <= AWG_MAX;
  const bare = valid ? awgDiameter(awg) : null;
  const insulated = valid ? insulatedDiameterAwg(awg, insulation) : null;
  const id = fieldId('secondary.wire.awg');
  const error = useFieldError('secondary.wire.awg');
  const inList = GAUGES.includes(awg);
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div>
        <label htmlFor={id} className="cw-label text-sm">
          {designField('secondary.wire.awg').label}
        </label>
        <select id={id} className="cw-input" disabled={readOnly} aria-describedby={`${id}-readout`} aria-invalid={error ? true : undefined} {...register('secondary.wire.awg')}>
          {!inList && awgText !== '' && <option value={awgText}>AWG {awgText}</option>}
          {GAUGES.map((g) => (
            <option key={g} value={String(g)}>
              AWG {gaugeLabel(g)}
            </option>
          ))}
        </select>
        {error && <p className="cw-field-error">{error}</p>}
        <FieldWarnings path="secondary.wire.awg" />
      </div>
      <SelectField path="secondary.wire.insulation" />
      <p id={`${id}-readout`} className="cw-hint sm:col-span-2" data-testid="awg-readout">
        {bare !== null && insulated !== null ? (
          <>
            Bare <strong className="text-ink">{formatLength(bare, system, 3)}</strong>, insulated{' '}
            <strong className="text-ink">{formatLength(insulated, system, 3)}</strong>{' '}
            <span title={INSULATION_SOURCE}>(typical enamel build; measure your wire when it matters)</span>
          </>
        ) : (
          'Choose a gauge to see the wire diameters.'
        )}
      </p>
    </div>
  );
}
