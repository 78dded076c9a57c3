/** Shape of a primary winding: flat spiral, helix (solenoid) or cone. */
export type PrimaryShape = 'flat' | 'helical' | 'conical';

/** A primary winding in SI units (lengths in m, angle in rad), measured to the datums of the public design format. */
export type PrimaryGeometry = {
  shape: PrimaryShape;
  /** Centre-line diameter of the innermost turn. */
  innerDiameter: number;
  /** Number of turns; may be fractional. */
  turns: number;
  conductorDiameter: number;
  /** Gap between neighbouring conductor surfaces; pitch = conductorDiameter + spacing. */
  spacing: number;
  /** Conical only: rise of the cone above horizontal, 0 < angle < π/2. */
  angle?: number;
  /** Height of the innermost turn above the primary reference plane. */
  elevation: number;
};

/** One turn as a coaxial circular filament; `weight` is the fraction of the turn in circuit (1 for whole turns). */
export type PrimaryRing = { r: number; z: number; weight: number };

/**
 * The primary's turns as coaxial rings at their centre-line radius and height, innermost first.
 *
 * Ring i sits at r = r0 + i·pitch·cos α, z = elevation + i·pitch·sin α, with r0 = innerDiameter/2,
 * pitch = conductorDiameter + spacing measured along the winding's slant, α = 0 (flat), π/2 (helical)
 * or the cone angle (conical). This is the ring model (Maxwell/Kirchhoff summation as used by F. W.
 * Grover, Inductance Calculations, 1946, from memory). A fractional last turn is a ring with weight equal to the fraction (see
 * {@link primaryRingsAtTap}); the geometry stays discrete per whole turn.
 *
 * Domain: see {@link validatePrimary}. @example primaryRings({ shape: 'flat', innerDiameter: 0.2, turns: 2, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 })
 * // [{ r: 0.1, z: 0, weight: 1 }, { r: 0.1127, z: 0, weight: 1 }]
 */
export function primaryRings(p: PrimaryGeometry): PrimaryRing[] {
  return primaryRingsAtTap(p, p.turns);
}

/**
 * The rings in circuit when the primary is tapped `tapTurns` turns from its inner end.
 *
 * floor(tap) whole rings plus, when the tap is fractional, the next ring with weight = fraction.
 * Approximation: a partial turn contributes `fraction ×` the current-weighted filament of the full
 * turn at the same place (its flux linkage and its field both scale by the fraction), so the tap
 * inductance L(tap) = Σ wᵢwⱼMᵢⱼ is continuous and increases monotonically with the tap, which a
 * root finder needs. A real partial turn is an arc, not a weaker full circle; the difference is a
 * fraction of one turn's self-inductance.
 *
 * Domain: 0 ≤ tapTurns ≤ p.turns. @example primaryRingsAtTap(p, 1.5).map((r) => r.weight) // [1, 0.5]
 */
export function primaryRingsAtTap(p: PrimaryGeometry, tapTurns: number): PrimaryRing[] {
  validatePrimary(p);
  if (!(tapTurns >= 0) || tapTurns > p.turns * (1 + 1e-12)) {
    throw new RangeError(`tap must be between 0 and ${p.turns} turns, got ${tapTurns}`);
  }
  const tap = Math.min(tapTurns, p.turns);
  const { dr, dz } = stepPerTurn(p);
  const r0 = 0.5 * p.innerDiameter;
  const whole = Math.floor(tap + 1e-12);
  const fraction = tap - whole;
  const rings: PrimaryRing[] = [];
  for (let i = 0; i < whole; i++) rings.push({ r: r0 + i * dr, z: p.elevation + i * dz, weight: 1 });
  if (fraction > 1e-12) rings.push({ r: r0 + whole * dr, z: p.elevation + whole * dz, weight: fraction });
  return rings;
}

/**
 * Length of conductor in the primary's first `turns` turns, in m.
 *
 * Method: the continuous winding whose turn i is centred on ring i, i.e. a spiral along the slant
 * coordinate s from −pitch/2 to (turns − ½)·pitch with r(s) = r0 + s·cos α and one revolution per
 * pitch. Its exact arc length is ∫√(1 + (2π r/pitch)²) ds = pitch/(2π cos α)·[G(2π r_b/pitch) −
 * G(2π r_a/pitch)], G(v) = ½(v√(1+v²) + asinh v) (the Archimedean-spiral integral); for a helix
 * (cos α → 0) it is turns·√((2π r0)² + pitch²). Leads are not included.
 *
 * Domain: as {@link validatePrimary}, 0 ≤ turns ≤ p.turns is not required (any turns ≥ 0).
 * @example primaryConductorLength({ shape: 'helical', innerDiameter: 0.3, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 }) // ≈ 11.31
 */
export function primaryConductorLength(p: PrimaryGeometry, turns: number = p.turns): number {
  validatePrimary(p);
  if (!(turns >= 0) || !Number.isFinite(turns)) throw new RangeError(`turns must be non-negative, got ${turns}`);
  const pitch = p.conductorDiameter + p.spacing;
  const alpha = slantAngle(p);
  const cos = Math.cos(alpha);
  const r0 = 0.5 * p.innerDiameter;
  if (cos < 1e-6) return turns * Math.hypot(2 * Math.PI * r0, pitch);
  const k = (2 * Math.PI) / pitch;
  const ra = r0 - 0.5 * pitch * cos;
  const rb = r0 + (turns - 0.5) * pitch * cos;
  const G = (v: number): number => 0.5 * (v * Math.sqrt(1 + v * v) + Math.asinh(v));
  return (G(k * rb) - G(k * ra)) / (k * cos);
}

/**
 * Overall outside diameter of the primary in the ring model, in m: the outermost ring's
 * centre-line diameter plus one conductor diameter. For a helix it is innerDiameter + conductorDiameter.
 * @example primaryOuterDiameter({ shape: 'flat', innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 }) // ≈ 0.48575
 */
export function primaryOuterDiameter(p: PrimaryGeometry): number {
  validatePrimary(p);
  const last = Math.max(0, Math.ceil(p.turns - 1e-12) - 1);
  return p.innerDiameter + 2 * last * stepPerTurn(p).dr + p.conductorDiameter;
}

/**
 * Throws a RangeError naming the offending field when a primary is not physically meaningful.
 * Requires innerDiameter > conductorDiameter > 0, spacing ≥ 0, 0 < turns ≤ 1000, finite elevation
 * and, for a cone, 0 < angle < π/2 rad.
 */
export function validatePrimary(p: PrimaryGeometry): void {
  if (!(p.conductorDiameter > 0) || !Number.isFinite(p.conductorDiameter)) {
    throw new RangeError('primary.conductorDiameter must be a positive length');
  }
  if (!(p.innerDiameter > p.conductorDiameter) || !Number.isFinite(p.innerDiameter)) {
    throw new RangeError('primary.innerDiameter must be larger than the conductor diameter');
  }
  if (!(p.spacing >= 0) || !Number.isFinite(p.spacing)) throw new RangeError('primary.spacing must be zero or positive');
  if (!(p.turns > 0) || p.turns > 1000) throw new RangeError('primary.turns must be between 0 and 1000');
  if (!Number.isFinite(p.elevation)) throw new RangeError('primary.elevation must be a finite length');
  if (p.shape === 'conical') {
    const a = p.angle;
    if (a === undefined || !(a > 0 && a < Math.PI / 2)) throw new RangeError('primary.angle must be between 0 and 90 degrees for a conical primary');
  } else if (p.shape !== 'flat' && p.shape !== 'helical') {
    throw new RangeError('primary.shape must be flat, helical or conical');
  }
}

function slantAngle(p: PrimaryGeometry): number {
  if (p.shape === 'flat') return 0;
  if (p.shape === 'helical') return Math.PI / 2;
  return p.angle as number;
}

function stepPerTurn(p: PrimaryGeometry): { dr: number; dz: number } {
  const pitch = p.conductorDiameter + p.spacing;
  if (p.shape === 'flat') return { dr: pitch, dz: 0 };
  if (p.shape === 'helical') return { dr: 0, dz: pitch };
  const a = p.angle as number;
  return { dr: pitch * Math.cos(a), dz: pitch * Math.sin(a) };
}
