import { primaryRings } from '../primary/geometry';
import type { DesignSI, Result, SolidStateSupplySI, SolverWarning } from '../types';
import { warning } from '../warnings';
import { primaryParams, toploadOuterRadius } from './geometry';

/** Typical winding length : diameter range, 2.5–5 : 1 (M. Rzeszotarski, Tesla Coil Mailing List, January 1997, pupman.com archive). */
export const ASPECT_RATIO_TYPICAL = { low: 2.5, high: 5 } as const;
/** Typical k for spark-gap coils, 0.05–0.2 (Stefan's tech notes, hotstreamer.deanostoybox.com/stk/tc/TECH4.HTM). */
export const COUPLING_SPARK_GAP_TYPICAL = { low: 0.05, high: 0.2 } as const;
/** Upper k for solid-state (DRSSTC) coils, about 0.3 (from memory; no primary source found). */
export const COUPLING_SOLID_STATE_HIGH = 0.3;
/** Total string DC rating of at least 2 × supply peak for transformer-fed tanks (common practice; no primary source found). */
export const BANK_RATING_FACTOR = 2;
/** Capacitance within this fraction of the transformer-resonant value invites resonant rise
 * (B. Hickman, Tesla Coil Mailing List, January 1999; P. Lawrence, Tesla Coil Mailing List, June 2003; common practice). */
export const RESONANT_BAND = 0.15;
/** Stored energy above which the large_stored_energy warning is raised. */
export const STORED_ENERGY_WARNING = 1;
/** Usual upper frequency for solid-state coils, 500 kHz (DRSSTC design guide, kaizerpowerelectronics.dk, secondary-coil chapter). */
export const SOLID_STATE_FREQUENCY_HIGH = 500e3;
/** Pitch above this multiple of the insulated diameter counts as space-wound (common practice; close winding is
 * the norm, M. Rzeszotarski, Tesla Coil Mailing List, January 1997). */
export const SPACE_WOUND_FACTOR = 1.5;

const fmt = (x: number, digits = 3) => Number(x.toPrecision(digits)).toString();

/** Warnings about a design that can be built but is unusual, risky or outside a model's range. */
export function designWarnings(d: DesignSI, r: Result): SolverWarning[] {
  const out: SolverWarning[] = [];
  const sec = r.secondary;
  if (sec) {
    if (sec.aspectRatio < ASPECT_RATIO_TYPICAL.low) {
      out.push(
        warning(
          'aspect_ratio_low',
          'secondary.windingLength',
          `Winding length is ${fmt(sec.aspectRatio)} × the winding diameter; most coils use 2.5 to 5 (M. Rzeszotarski, Tesla Coil Mailing List, 1997). ` +
            'A short winding couples tightly and flashes over more easily.',
        ),
      );
    } else if (sec.aspectRatio > ASPECT_RATIO_TYPICAL.high) {
      out.push(
        warning(
          'aspect_ratio_high',
          'secondary.windingLength',
          `Winding length is ${fmt(sec.aspectRatio)} × the winding diameter; most coils use 2.5 to 5 (M. Rzeszotarski, Tesla Coil Mailing List, 1997). ` +
            'Tall thin coils tend to perform poorly.',
        ),
      );
    }
    if (!sec.selfCapacitanceInRange) {
      out.push(
        warning(
          'medhurst_out_of_range',
          'secondary.windingLength',
          `Aspect ratio ${fmt(sec.aspectRatio)} lies outside Medhurst's measured table (1947); the self-capacitance is extrapolated and less certain.`,
        ),
      );
    }
    if (sec.pitch > SPACE_WOUND_FACTOR * d.secondary.wire.insulatedDiameter) {
      out.push(
        warning(
          'space_wound',
          'secondary.windingLength',
          'The winding is space-wound; inductance and self-capacitance formulas are less accurate for spaced turns ' +
            '(builders report inductance about 5 % low: Tesla Coil Mailing List, June 1999).',
        ),
      );
    }
  }

  const t = d.topload;
  if (t && sec && 2 * toploadOuterRadius(t) < sec.windingDiameter) {
    out.push(
      warning(
        'topload_smaller_than_form',
        t.shape === 'toroid' ? 'topload.majorDiameter' : 'topload.diameter',
        'The topload is narrower than the secondary winding; it adds little capacitance and does not shield the top turns. ' +
          'Toroids are usually 2.5–5 × the secondary diameter (hvtesla.com toroid notes; common practice).',
      ),
    );
  }

  const p = d.primary;
  if (p && sec && (p.shape !== 'conical' || p.angle !== null)) {
    const inner = primaryRings(primaryParams(p))[0];
    if (inner && inner.r - p.conductorDiameter / 2 < sec.windingDiameter / 2) {
      out.push(
        warning(
          'primary_inside_form',
          'primary.innerDiameter',
          "The primary's inner turn lies inside the secondary's diameter (above or below the winding). " +
            'Flashover and strikes to the primary are likely; builders leave about 1.5–2 in between them (D. C. Cox, Tesla Coil Mailing List, January 1998).',
        ),
      );
    }
  }

  const c = r.coupling;
  const supply = d.supply;
  if (c && supply) {
    const k = c.kAtTap ?? c.k;
    if (supply.kind === 'transformer' && k > COUPLING_SPARK_GAP_TYPICAL.high) {
      out.push(
        warning(
          'coupling_high_for_spark_gap',
          'secondary.elevation',
          `k = ${fmt(k)} is above the 0.05–0.2 usual for spark-gap coils (Stefan's tech notes, hotstreamer.deanostoybox.com): expect racing sparks and flashover; raise the secondary.`,
        ),
      );
    } else if (supply.kind === 'transformer' && k < COUPLING_SPARK_GAP_TYPICAL.low) {
      out.push(
        warning(
          'coupling_low_for_spark_gap',
          'secondary.elevation',
          `k = ${fmt(k)} is below the 0.05–0.2 usual for spark-gap coils (Stefan's tech notes, hotstreamer.deanostoybox.com): energy transfers slowly and gap losses grow; lower the secondary.`,
        ),
      );
    } else if (supply.kind === 'solid-state' && k > COUPLING_SOLID_STATE_HIGH) {
      out.push(
        warning(
          'coupling_high_for_solid_state',
          'secondary.elevation',
          `k = ${fmt(k)} is above the roughly 0.3 solid-state coils run at (from memory): expect racing sparks; raise the secondary.`,
        ),
      );
    }
  }

  const tank = r.tank;
  if (tank && supply && d.tank && supply.kind === 'transformer') {
    const peak = Math.SQRT2 * supply.voltage;
    const ratingPath = d.tank.kind === 'bank' ? 'tank.unitVoltage' : 'tank';
    if (tank.voltageRating !== null && tank.voltageRating < peak) {
      out.push(
        warning(
          'bank_rating_below_peak',
          ratingPath,
          `The tank's voltage rating (${fmt(tank.voltageRating / 1000)} kV) is below the supply peak (${fmt(peak / 1000)} kV): ` +
            'the capacitors will fail, possibly violently. Add units in series.',
        ),
      );
    } else if (tank.voltageRating !== null && tank.voltageRating < BANK_RATING_FACTOR * peak) {
      out.push(
        warning(
          'bank_rating_low',
          ratingPath,
          `The tank's voltage rating (${fmt(tank.voltageRating / 1000)} kV) is below 2 × the supply peak ` +
            `(${fmt((2 * peak) / 1000)} kV), the margin builders usually keep (common practice).`,
        ),
      );
    }
    if (tank.energyAtSupplyPeak !== null && tank.energyAtSupplyPeak > STORED_ENERGY_WARNING) {
      out.push(
        warning(
          'large_stored_energy',
          'tank',
          `The tank stores ${fmt(tank.energyAtSupplyPeak)} J at the supply peak. That can kill: fit bleeders, ` +
            'and short the bank by hand before touching.',
        ),
      );
    }
  }
  const sup = r.supply;
  if (sup && sup.kind === 'transformer' && sup.tankToResonantRatio !== null && Math.abs(sup.tankToResonantRatio - 1) < RESONANT_BAND) {
    out.push(
      warning(
        'tank_near_resonant',
        'tank',
        `The tank is ${fmt(sup.tankToResonantRatio, 2)} × the transformer-resonant capacitance. If the gap misses, resonant rise can ` +
          'destroy the transformer; builders use about 1.5 × with static gaps (LTR; Tesla Coil Mailing List, June 2003; common practice).',
      ),
    );
  }
  if (supply && supply.kind === 'transformer' && supply.breakRate === null && d.tank) {
    out.push(
      warning(
        'break_rate_assumed',
        'supply.breakRate',
        `No break rate given: ${fmt(2 * supply.lineFrequency)} per second (one firing per half-cycle) assumed for the power figures.`,
      ),
    );
  }
  if (supply && supply.kind === 'solid-state' && r.system && r.system.resonantFrequency > SOLID_STATE_FREQUENCY_HIGH) {
    out.push(
      warning(
        'frequency_high_for_solid_state',
        'secondary.turns',
        `The loaded frequency (${fmt(r.system.resonantFrequency / 1000)} kHz) is above the 35–500 kHz solid-state coils usually run at; ` +
          'switching losses rise with frequency (DRSSTC design guide, kaizerpowerelectronics.dk).',
      ),
    );
  }
  if (supply && supply.kind === 'solid-state') out.push(...driveWarnings(d, r, supply));
  return out;
}

/** Labels of the solid-state fields a design may leave out, for the defaults warning (the registry's wording). */
const DRIVE_FIELD_NAMES: Record<string, { label: string; value: (s: SolidStateSupplySI) => string }> = {
  topology: { label: 'drive topology', value: (s) => s.topology },
  bridge: { label: 'bridge', value: (s) => `${s.bridge} bridge` },
  onTime: { label: 'interrupter on-time', value: (s) => `${fmt(s.onTime * 1e6)} µs` },
  repetitionRate: { label: 'repetition rate', value: (s) => `${fmt(s.repetitionRate)} Hz` },
  tuningRatio: { label: 'primary to secondary frequency ratio', value: (s) => fmt(s.tuningRatio) },
};

/** Usual bound on bus droop over one burst: 10 % of the bus (common practice). */
export const BUS_DROOP_HIGH = 0.1;

/** Warnings of a bridge-driven coil: defaults taken, the bank against the burst, droop, tuning above the secondary. */
export function driveWarnings(d: DesignSI, r: Result, supply: SolidStateSupplySI): SolverWarning[] {
  const out: SolverWarning[] = [];
  const assumed = supply.defaulted.filter((f) => f in DRIVE_FIELD_NAMES && !(f === 'tuningRatio' && supply.topology === 'single-resonant'));
  if (assumed.length > 0) {
    out.push(
      warning(
        'drive_defaults_assumed',
        'supply',
        `The solid-state supply does not give its ${assumed.map((f) => DRIVE_FIELD_NAMES[f].label).join(', ')}; assumed ` +
          `${assumed.map((f) => DRIVE_FIELD_NAMES[f].value(supply)).join(', ')} (common practice). Enter the coil's own values.`,
      ),
    );
  }
  const dr = r.drive;
  if (!dr) return out;
  const b = dr.bank;
  if (b && b.voltageMargin < 1) {
    out.push(
      warning(
        'bank_unit_voltage_exceeded',
        'tank.unitVoltage',
        `Each capacitor sees ${fmt(b.unitPeakVoltage)} V peak in the burst, above its ${fmt(b.unitVoltage)} V rating: ` +
          'add capacitors in series (and strings in parallel to keep the capacitance), or shorten the on-time.',
      ),
    );
  }
  if (b && b.currentMargin !== null && b.currentMargin < 1) {
    out.push(
      warning(
        'bank_unit_current_exceeded',
        'tank.unitRmsCurrent',
        `Each string carries ${fmt(b.stringRmsCurrent)} A RMS at this repetition rate, above the capacitors' ${fmt(b.unitRmsCurrent!)} A rating: ` +
          'they will overheat. Add strings in parallel or lower the repetition rate or on-time.',
      ),
    );
  }
  if (d.tank && d.tank.kind === 'single' && dr.capacitorPeakVoltage !== null) {
    out.push(
      warning(
        'tank_rating_unknown',
        'tank',
        `The tank sees ${fmt(dr.capacitorPeakVoltage / 1000)} kV peak and ${fmt(dr.capacitorRmsCurrent ?? 0)} A RMS in the burst; ` +
          'give it as a bank of capacitors with their ratings to have them checked.',
      ),
    );
  }
  if (dr.busDroop !== null && dr.busDroop > BUS_DROOP_HIGH * dr.busVoltage) {
    out.push(
      warning(
        'bus_droop_high',
        'supply.busCapacitance',
        `The bus falls by ${fmt(dr.busDroop)} V (${fmt((100 * dr.busDroop) / dr.busVoltage, 2)} %) over a burst, more than the ` +
          `${100 * BUS_DROOP_HIGH} % builders usually allow (common practice): add bus capacitance or shorten the on-time.`,
      ),
    );
  }
  if (dr.topology === 'dual-resonant' && dr.frequencyRatio !== null && dr.frequencyRatio > 1) {
    out.push(
      warning(
        'primary_above_secondary',
        'supply.tuningRatio',
        `The primary is tuned ${fmt((dr.frequencyRatio - 1) * 100, 2)} % above the secondary; dual-resonant coils are tuned ` +
          'below it (about 0.85–0.95 ×, common practice), since streamers pull the secondary down.',
      ),
    );
  }
  return out;
}
