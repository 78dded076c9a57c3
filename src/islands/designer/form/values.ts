import type { DesignInput } from '~/lib/design';
import { DESIGN_FIELDS, defaultText, pathsOfKind } from '~/lib/design/registry';
import { lengthInputText, convertLengthText, type UnitSystem } from '~/lib/format';
import { browserDecimalMark, canonicalNumberText, readNumberText } from '~/lib/format/read-number';

type Fields = (typeof DESIGN_FIELDS)[number];
type UnionToIntersection<U> = (U extends unknown ? (x: U) => void : never) extends (x: infer I) => void ? I : never;
type Simplify<T> = T extends object ? { [K in keyof T]: Simplify<T[K]> } : T;
type Leaf<P extends string, V> = P extends `${infer H}.${infer T}` ? { [K in H]: Leaf<T, V> } : { [K in P]: V };
/** Parts that may be absent get a "none" choice in the form. */
type NoneChoice = 'topload.shape' | 'supply.kind';
type FieldValue<F> = F extends { path: infer P; kind: 'choice'; options: ReadonlyArray<{ value: infer V }> }
  ? V | (P extends NoneChoice ? 'none' : never)
  : string;
type RegistryValues = UnionToIntersection<Fields extends infer F ? (F extends { path: infer P extends string } ? Leaf<P, FieldValue<F>> : never) : never>;

/** The form's own switches, which are not fields of the design: they pick a variant or turn a part on. */
interface FormSwitches {
  name: string;
  secondary: { wireMode: 'awg' | 'diameter' };
  primary: { enabled: boolean };
  tank: { mode: 'none' | 'single' | 'bank' };
  tuning: { streamerMode: 'capacitance' | 'length' };
}

/**
 * What the designer's form holds: every field of the design registry as the text in its input (a choice
 * as its value), plus the switches, so that turning a part off and on again keeps what was typed. Field
 * paths mirror the design's, so the schema's issues land on the right input.
 */
export type FormValues = Simplify<RegistryValues & FormSwitches>;

/** Paths of the fields that hold lengths: these follow the unit switch. */
export const LENGTH_PATHS = pathsOfKind('length');

export type LengthPath = (typeof LENGTH_PATHS)[number];

function setAt(o: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let cur = o;
  for (const p of parts.slice(0, -1)) cur = (cur[p] ??= {}) as Record<string, unknown>;
  cur[parts[parts.length - 1]] = value;
}

/** A blank, buildable starting point used when there is neither an example nor a draft: the registry's defaults. */
export function emptyValues(system: UnitSystem): FormValues {
  const L = (m: number) => lengthInputText(m, system, 4);
  const v: Record<string, unknown> = {};
  for (const f of DESIGN_FIELDS) setAt(v, f.path, defaultText(f, system, L));
  const switches: Array<[string, unknown]> = [
    ['name', 'Untitled coil'],
    ['secondary.wireMode', 'awg'],
    ['topload.shape', 'none'],
    ['primary.enabled', false],
    ['tank.mode', 'none'],
    ['supply.kind', 'none'],
    ['tuning.streamerMode', 'capacitance'],
  ];
  for (const [path, value] of switches) setAt(v, path, value);
  return v as unknown as FormValues;
}

const text = (v: number | string | undefined, kind: 'length' | 'other', system: UnitSystem): string => {
  if (v === undefined) return '';
  if (typeof v === 'number') {
    if (kind === 'length') return lengthInputText(v, system);
    return String(v);
  }
  return kind === 'length' ? convertLengthText(v, system) : v;
};

/** Fills the form from a design as stored, lengths shown in `system` (the same lengths, rewritten). */
export function fromDesignInput(d: DesignInput, name: string, system: UnitSystem): FormValues {
  const v = emptyValues(system);
  v.name = name;
  const Lt = (x: number | string | undefined) => text(x, 'length', system);
  const Ot = (x: number | string | undefined) => text(x, 'other', system);
  const s = d.secondary;
  v.secondary.formDiameter = Lt(s.formDiameter);
  v.secondary.turns = String(s.turns);
  if ('awg' in s.wire) {
    v.secondary.wireMode = 'awg';
    v.secondary.wire.awg = String(s.wire.awg);
    v.secondary.wire.insulation = s.wire.insulation;
  } else {
    v.secondary.wireMode = 'diameter';
    v.secondary.wire.diameter = Lt(s.wire.diameter);
    v.secondary.wire.insulatedDiameter = Lt(s.wire.insulatedDiameter);
  }
  v.secondary.windingLength = Lt(s.windingLength);
  v.secondary.elevation = Lt(s.elevation);
  if (s.former) {
    v.secondary.former.material = (s.former.material ?? '') as typeof v.secondary.former.material;
    v.secondary.former.permittivity = s.former.permittivity === undefined ? '' : String(s.former.permittivity);
    v.secondary.former.wallThickness = Lt(s.former.wallThickness);
  }
  if (d.strikeRail) {
    v.strikeRail.diameter = Lt(d.strikeRail.diameter);
    v.strikeRail.height = Lt(d.strikeRail.height);
    v.strikeRail.conductorDiameter = Lt(d.strikeRail.conductorDiameter);
  }
  v.groundClearance = d.groundClearance === undefined ? '' : Lt(d.groundClearance);
  if (d.topload) {
    v.topload.shape = d.topload.shape;
    if (d.topload.shape === 'toroid') {
      v.topload.majorDiameter = Lt(d.topload.majorDiameter);
      v.topload.minorDiameter = Lt(d.topload.minorDiameter);
    } else v.topload.diameter = Lt(d.topload.diameter);
    v.topload.elevation = Lt(d.topload.elevation);
  }
  if (d.primary) {
    const p = d.primary;
    v.primary = {
      enabled: true,
      shape: p.shape,
      innerDiameter: Lt(p.innerDiameter),
      turns: String(p.turns),
      conductorDiameter: Lt(p.conductorDiameter),
      spacing: Lt(p.spacing),
      angle: p.angle === undefined ? v.primary.angle : Ot(p.angle),
      elevation: Lt(p.elevation),
    };
  }
  if (d.tank) {
    if ('capacitance' in d.tank) {
      v.tank.mode = 'single';
      v.tank.capacitance = Ot(d.tank.capacitance);
    } else {
      v.tank.mode = 'bank';
      v.tank.unitCapacitance = Ot(d.tank.unitCapacitance);
      v.tank.unitVoltage = Ot(d.tank.unitVoltage);
      v.tank.series = String(d.tank.series);
      v.tank.parallel = String(d.tank.parallel);
      v.tank.unitRmsCurrent = Ot(d.tank.unitRmsCurrent);
    }
  }
  if (d.supply) {
    if (d.supply.kind === 'transformer') {
      v.supply.kind = 'transformer';
      v.supply.voltage = Ot(d.supply.voltage);
      v.supply.current = Ot(d.supply.current);
      v.supply.lineFrequency = Ot(d.supply.lineFrequency);
      v.supply.breakRate = Ot(d.supply.breakRate);
    } else {
      const u = d.supply;
      v.supply.kind = 'solid-state';
      v.supply.busVoltage = Ot(u.busVoltage);
      if (u.topology !== undefined) v.supply.topology = u.topology;
      if (u.bridge !== undefined) v.supply.bridge = u.bridge;
      // left out in a saved design: blank, so the stated default applies and its warning is shown
      v.supply.onTime = Ot(u.onTime);
      v.supply.repetitionRate = Ot(u.repetitionRate);
      v.supply.switchPeakCurrent = Ot(u.switchPeakCurrent);
      v.supply.currentLimit = Ot(u.currentLimit);
      v.supply.busCapacitance = Ot(u.busCapacitance);
      v.supply.tuningRatio = u.tuningRatio === undefined ? '' : String(u.tuningRatio);
    }
  }
  const t = d.tuning;
  if (t) {
    v.tuning.streamerCapacitance = Ot(t.streamerCapacitance);
    v.tuning.streamerLength = Lt(t.streamerLength);
    v.tuning.streamerMode = t.streamerLength !== undefined && t.streamerCapacitance === undefined ? 'length' : 'capacitance';
    v.tuning.targetCoupling = t.targetCoupling === undefined ? '' : String(t.targetCoupling);
  }
  return v;
}

/**
 * A quantity's text as the schema and the saved design take it: its number read by the one number rule in
 * the browser's locale and written plainly ("1,000 mm" → "1000 mm", "0,5 in" → "0.5 in").
 */
const qt = (s: string): string => canonicalNumberText(s.trim(), browserDecimalMark());

/** Optional text: blank means "not given" (the schema's default applies). */
const opt = (s: string): string | undefined => (s.trim() === '' ? undefined : qt(s));

/**
 * A number field as the schema wants it: a JS number when the text is a number by the one number rule
 * ("1,000" → 1000), otherwise the text itself so the schema's message names the problem.
 */
function num(s: string): number | string {
  const t = s.trim();
  const r = readNumberText(t, browserDecimalMark());
  return r?.ok ? r.value : t;
}

function withoutUndefined<T extends Record<string, unknown>>(o: T): T {
  for (const k of Object.keys(o)) if (o[k] === undefined) delete o[k];
  return o;
}

/** The design the form describes, in the shape the API and the solver take. */
export function toDesignInput(v: FormValues): DesignInput {
  const s = v.secondary;
  const wire =
    s.wireMode === 'awg'
      ? { awg: num(s.wire.awg), insulation: s.wire.insulation }
      : { diameter: qt(s.wire.diameter), insulatedDiameter: qt(s.wire.insulatedDiameter) };
  const t = v.topload;
  const topload =
    t.shape === 'toroid'
      ? withoutUndefined({ shape: 'toroid' as const, majorDiameter: qt(t.majorDiameter), minorDiameter: qt(t.minorDiameter), elevation: opt(t.elevation) })
      : t.shape === 'sphere'
        ? withoutUndefined({ shape: 'sphere' as const, diameter: qt(t.diameter), elevation: opt(t.elevation) })
        : null;
  const p = v.primary;
  const primary = p.enabled
    ? withoutUndefined({
        shape: p.shape,
        innerDiameter: qt(p.innerDiameter),
        turns: num(p.turns),
        conductorDiameter: qt(p.conductorDiameter),
        spacing: qt(p.spacing),
        angle: p.shape === 'conical' ? qt(p.angle) : undefined,
        elevation: opt(p.elevation),
      })
    : null;
  const k = v.tank;
  const tank =
    k.mode === 'single'
      ? { capacitance: qt(k.capacitance) }
      : k.mode === 'bank'
        ? withoutUndefined({
            unitCapacitance: qt(k.unitCapacitance),
            unitVoltage: qt(k.unitVoltage),
            series: num(k.series),
            parallel: num(k.parallel),
            unitRmsCurrent: opt(k.unitRmsCurrent),
          })
        : null;
  const u = v.supply;
  const supply =
    u.kind === 'transformer'
      ? withoutUndefined({
          kind: 'transformer' as const,
          voltage: qt(u.voltage),
          current: qt(u.current),
          lineFrequency: qt(u.lineFrequency),
          breakRate: opt(u.breakRate),
        })
      : u.kind === 'solid-state'
        ? withoutUndefined({
            kind: 'solid-state' as const,
            busVoltage: qt(u.busVoltage),
            topology: u.topology,
            bridge: u.bridge,
            onTime: opt(u.onTime),
            repetitionRate: opt(u.repetitionRate),
            switchPeakCurrent: opt(u.switchPeakCurrent),
            currentLimit: opt(u.currentLimit),
            busCapacitance: opt(u.busCapacitance),
            tuningRatio: opt(u.tuningRatio) === undefined ? undefined : num(u.tuningRatio),
          })
        : null;
  const g = v.tuning;
  const tuning = withoutUndefined({
    streamerCapacitance: g.streamerMode === 'capacitance' ? opt(g.streamerCapacitance) : undefined,
    streamerLength: g.streamerMode === 'length' ? opt(g.streamerLength) : undefined,
    targetCoupling: opt(g.targetCoupling) === undefined ? undefined : num(g.targetCoupling),
  });
  const f = s.former;
  const former = withoutUndefined({
    material: opt(String(f.material)),
    permittivity: opt(f.permittivity) === undefined ? undefined : num(f.permittivity),
    wallThickness: opt(f.wallThickness),
  });
  const r = v.strikeRail;
  const strikeRail = withoutUndefined({ diameter: opt(r.diameter), height: opt(r.height), conductorDiameter: opt(r.conductorDiameter) });
  const design = withoutUndefined({
    secondary: withoutUndefined({
      formDiameter: qt(s.formDiameter),
      turns: num(s.turns),
      wire,
      windingLength: opt(s.windingLength),
      elevation: opt(s.elevation),
      former: Object.keys(former).length ? former : undefined,
    }),
    groundClearance: opt(v.groundClearance),
    topload,
    // a rail with any field given goes to the schema, which names a missing diameter
    strikeRail: Object.keys(strikeRail).length ? { ...strikeRail, diameter: qt(r.diameter) } : undefined,
    primary,
    tank,
    supply,
    tuning: Object.keys(tuning).length ? tuning : undefined,
  });
  // the schema decides whether each field is acceptable; the cast only names the intended shape
  return design as unknown as DesignInput;
}

/** Rewrites every length field in the other unit system; invalid text is left as typed. */
export function convertLengths(v: FormValues, system: UnitSystem): FormValues {
  const next: FormValues = structuredClone(v);
  for (const path of LENGTH_PATHS) {
    const parts = path.split('.');
    let o = next as unknown as Record<string, unknown>;
    for (const p of parts.slice(0, -1)) o = o[p] as Record<string, unknown>;
    const last = parts[parts.length - 1];
    const cur = o[last];
    if (typeof cur === 'string' && cur.trim() !== '') o[last] = convertLengthText(cur, system);
  }
  return next;
}
