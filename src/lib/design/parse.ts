import type { z } from 'zod';
import { awgDiameter } from '../../solver/wire/awg';
import { insulatedDiameter } from '../../solver/wire/insulation';
import { checkDesign } from '../../solver/system/checks';
import { streamerCapacitanceForLength } from '../../solver/tuning/streamer';
import type { DesignIssue, DesignSI, FormerSI, PrimarySI, SolidStateSupplySI, StrikeRailSI, SupplySI, TankSI, ToploadSI } from '../../solver/types';
import { DEFAULT_FORMER, FORMER_PERMITTIVITY } from '../../solver/field/former';
import { si } from './fields';
import { designInputSchema, KNOWN_FIELDS, type DesignInput } from './schema';
import { SOLID_STATE_DEFAULTS } from './registry';

export type { DesignSI, DesignIssue };

export const DEFAULT_GROUND_CLEARANCE = 0.5;
/** Strike-rail conductor when none is given: 6 mm (a heavy ground wire; an assumption, stated in the field's description). */
export const DEFAULT_RAIL_CONDUCTOR = 6e-3;

export type ParseDesignResult =
  | { ok: true; design: DesignSI; input: DesignInput }
  | { ok: false; issues: DesignIssue[] };

type Issue = z.core.$ZodIssue;

/**
 * Validates a design as given by a user (field by field, then across fields) and resolves it into SI
 * base units with every default applied. `input` is returned exactly as given.
 */
export function parseDesign(input: unknown): ParseDesignResult {
  const parsed = designInputSchema.safeParse(input);
  if (!parsed.success) {
    return { ok: false, issues: dedupe(parsed.error.issues.flatMap((i) => plainIssues(i, [], input))) };
  }
  const design = toDesignSI(parsed.data);
  const issues = checkDesign(design);
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, design, input: input as DesignInput };
}

/** Resolves a validated input into SI, applying the defaults (ground clearance 0.5 m, elevations 0, close winding). */
export function toDesignSI(d: DesignInput): DesignSI {
  const s = d.secondary;
  const wire =
    'awg' in s.wire
      ? {
          diameter: awgDiameter(s.wire.awg),
          insulatedDiameter: insulatedDiameter(awgDiameter(s.wire.awg), s.wire.insulation),
          awg: s.wire.awg,
          insulation: s.wire.insulation,
        }
      : { diameter: si(s.wire.diameter, 'length'), insulatedDiameter: si(s.wire.insulatedDiameter, 'length'), awg: null, insulation: null };

  let topload: ToploadSI | null = null;
  if (d.topload) {
    const elevation = d.topload.elevation === undefined ? 0 : si(d.topload.elevation, 'length');
    topload =
      d.topload.shape === 'toroid'
        ? { shape: 'toroid', majorDiameter: si(d.topload.majorDiameter, 'length'), minorDiameter: si(d.topload.minorDiameter, 'length'), elevation }
        : { shape: 'sphere', diameter: si(d.topload.diameter, 'length'), elevation };
  }

  let primary: PrimarySI | null = null;
  if (d.primary) {
    const p = d.primary;
    primary = {
      shape: p.shape,
      innerDiameter: si(p.innerDiameter, 'length'),
      turns: p.turns,
      conductorDiameter: si(p.conductorDiameter, 'length'),
      spacing: si(p.spacing, 'length'),
      angle: p.shape === 'conical' && p.angle !== undefined ? si(p.angle, 'angle') : null,
      elevation: p.elevation === undefined ? 0 : si(p.elevation, 'length'),
    };
  }

  let tank: TankSI | null = null;
  if (d.tank) {
    tank =
      'capacitance' in d.tank
        ? { kind: 'single', capacitance: si(d.tank.capacitance, 'capacitance') }
        : {
            kind: 'bank',
            unitCapacitance: si(d.tank.unitCapacitance, 'capacitance'),
            unitVoltage: si(d.tank.unitVoltage, 'voltage'),
            series: d.tank.series,
            parallel: d.tank.parallel,
            unitRmsCurrent: d.tank.unitRmsCurrent === undefined ? null : si(d.tank.unitRmsCurrent, 'current'),
          };
  }

  let supply: SupplySI | null = null;
  if (d.supply) {
    supply =
      d.supply.kind === 'transformer'
        ? {
            kind: 'transformer',
            voltage: si(d.supply.voltage, 'voltage'),
            current: si(d.supply.current, 'current'),
            lineFrequency: si(d.supply.lineFrequency, 'frequency'),
            breakRate: d.supply.breakRate === undefined ? null : si(d.supply.breakRate, 'frequency'),
          }
        : solidStateSI(d.supply);
  }

  const f = s.former;
  const former: FormerSI | null = f
    ? {
        material: f.material ?? (f.permittivity === undefined ? 'pvc' : null),
        permittivity: f.permittivity ?? FORMER_PERMITTIVITY[f.material ?? 'pvc'],
        wallThickness: f.wallThickness === undefined ? DEFAULT_FORMER.wallThickness : si(f.wallThickness, 'length'),
        assumed: false,
      }
    : null;
  const r = d.strikeRail;
  const strikeRail: StrikeRailSI | null = r
    ? {
        diameter: si(r.diameter, 'length'),
        height: r.height === undefined ? 0 : si(r.height, 'length'),
        conductorDiameter: r.conductorDiameter === undefined ? DEFAULT_RAIL_CONDUCTOR : si(r.conductorDiameter, 'length'),
      }
    : null;

  const t = d.tuning ?? {};
  const streamerLength = t.streamerLength === undefined ? null : si(t.streamerLength, 'length');
  const streamerCapacitance =
    t.streamerCapacitance !== undefined
      ? si(t.streamerCapacitance, 'capacitance')
      : streamerLength !== null
        ? streamerCapacitanceForLength(streamerLength)
        : 0;

  return {
    secondary: {
      formDiameter: si(s.formDiameter, 'length'),
      turns: s.turns,
      wire,
      windingLength: s.windingLength === undefined ? null : si(s.windingLength, 'length'),
      elevation: s.elevation === undefined ? 0 : si(s.elevation, 'length'),
      former,
    },
    strikeRail,
    groundClearance: d.groundClearance === undefined ? DEFAULT_GROUND_CLEARANCE : si(d.groundClearance, 'length'),
    topload,
    primary,
    tank,
    supply,
    tuning: { streamerCapacitance, streamerLength, targetCoupling: t.targetCoupling ?? null },
  };
}

type SolidStateInput = Extract<NonNullable<DesignInput['supply']>, { kind: 'solid-state' }>;

/** A solid-state supply in SI; fields left out take SOLID_STATE_DEFAULTS and are listed in `defaulted`. */
export function solidStateSI(u: SolidStateInput): SolidStateSupplySI {
  const defaulted: string[] = [];
  const pick = <T>(name: string, given: T | undefined, fallback: T): T => {
    if (given !== undefined) return given;
    defaulted.push(name);
    return fallback;
  };
  const D = SOLID_STATE_DEFAULTS;
  return {
    kind: 'solid-state',
    busVoltage: si(u.busVoltage, 'voltage'),
    topology: pick('topology', u.topology, D.topology),
    bridge: pick('bridge', u.bridge, D.bridge),
    onTime: pick('onTime', u.onTime === undefined ? undefined : si(u.onTime, 'time'), D.onTime),
    repetitionRate: pick('repetitionRate', u.repetitionRate === undefined ? undefined : si(u.repetitionRate, 'frequency'), D.repetitionRate),
    switchPeakCurrent: u.switchPeakCurrent === undefined ? null : si(u.switchPeakCurrent, 'current'),
    currentLimit: u.currentLimit === undefined ? null : si(u.currentLimit, 'current'),
    busCapacitance: u.busCapacitance === undefined ? null : si(u.busCapacitance, 'capacitance'),
    tuningRatio: pick('tuningRatio', u.tuningRatio, D.tuningRatio),
    defaulted,
  };
}

/** One line per issue, "path: message", for terminals and logs. */
export function formatIssues(issues: readonly DesignIssue[]): string {
  return issues.map((i) => `${i.path || '(design)'}: ${i.message}`).join('\n');
}

function pathString(path: ReadonlyArray<PropertyKey>): string {
  return path.map((p) => (typeof p === 'number' ? `[${p}]` : String(p))).join('.').replace(/\.\[/g, '[');
}

function valueAt(root: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let v = root;
  for (const p of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[p];
  }
  return v;
}

/** Turns zod's issues into plain per-field messages; unions of objects report the branch the input meant. */
function plainIssues(issue: Issue, base: ReadonlyArray<PropertyKey>, root: unknown): DesignIssue[] {
  const path = [...base, ...issue.path];
  const at = valueAt(root, path);
  if (issue.code === 'invalid_union' && at !== null && typeof at === 'object' && !Array.isArray(at) && issue.errors.length > 0) {
    const branches = issue.errors;
    let best = branches[0];
    for (const br of branches) if (br.length < best.length) best = br;
    return best.flatMap((i) => plainIssues(i, path, root));
  }
  if (issue.code === 'unrecognized_keys') {
    return issue.keys.map((key) => {
      const hint = closest(key);
      return {
        path: pathString([...path, key]),
        message: `is not a known field${hint ? ` (did you mean "${hint}"?)` : ''}`,
      };
    });
  }
  if (issue.code === 'invalid_type' && at === undefined) return [{ path: pathString(path), message: 'is required' }];
  if (issue.code === 'invalid_type' && issue.expected === 'object') {
    return [{ path: pathString(path), message: at === null ? 'must be an object, not null' : 'expected an object with fields' }];
  }
  if (issue.code === 'invalid_union' && issue.message === 'Invalid input') {
    return [{ path: pathString(path), message: 'has an unexpected form' }];
  }
  return [{ path: pathString(path), message: issue.message }];
}

function dedupe(issues: DesignIssue[]): DesignIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const k = `${i.path}\u0000${i.message}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}

function closest(key: string): string | null {
  let best: string | null = null;
  let bestD = Infinity;
  for (const f of KNOWN_FIELDS) {
    const d = editDistance(key.toLowerCase(), f.toLowerCase());
    if (d < bestD) {
      bestD = d;
      best = f;
    }
  }
  return bestD <= Math.max(1, Math.floor(key.length / 3)) ? best : null;
}

function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return row[b.length];
}
