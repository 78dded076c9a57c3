import { LuDecomposition, Matrix } from 'ml-matrix';
import { EPSILON_0 } from '../constants';
import { gaussLegendre } from '../math/gauss';
import { curveOf, ringKernel, selfPanel, type AxisymmetricShape, type Curve } from '../topload/bem';

/**
 * The resonator as the electrostatic model sees it, axisymmetric about z, lengths in metres. Heights are
 * measured from the ground plane (z = 0) when `ground` is true; without it the structure is isolated and
 * potentials are referred to infinity.
 */
export interface StructureGeometry {
  /** the winding as a cylindrical surface at the wire centres */
  winding: { radius: number; zBottom: number; length: number };
  /** topload at the top node's potential (its panel count from the discretisation); null: none */
  topload: AxisymmetricShape | null;
  /** grounded thin rings: the primary's turns and a strike rail */
  rings: ReadonlyArray<{ r: number; z: number; wireRadius: number }>;
  ground: boolean;
}

export interface StructureDiscretisation {
  /** winding sections (nodes 1…sections carry the unknown voltages; node 0 is the grounded base) */
  sections: number;
  /** panels along the winding, graded towards both ends */
  windingPanels: number;
  /** panels along the topload's generating curve */
  toploadPanels: number;
}

export interface StructureCapacitance {
  /** Maxwell capacitance matrix between nodes 1…N (N = sections; node N joined to the topload), F, row-major */
  matrix: Float64Array;
  /** the same with the topload left out (the winding alone in the same surroundings) */
  coilAlone: Float64Array;
  /** the topload alone at 1 V in the same surroundings, F (0 without a topload) */
  toploadAlone: number;
  /** node heights (N + 1 values, base first), same frame as the geometry */
  nodeZ: Float64Array;
  panels: number;
}

/** A panel: a stretch [ta, ta + h] of a generating curve, or a thin ring (the whole ring is one unknown). */
type Panel =
  | { kind: 'curve'; curve: Curve; ta: number; h: number; body: 'winding' | 'topload' }
  | { kind: 'ring'; r: number; z: number; a: number };

const RULES = [gaussLegendre(2), gaussLegendre(4), gaussLegendre(8)];
const FOUR_PI2_EPS0 = 4 * Math.PI * Math.PI * EPSILON_0;
/** End grading of the winding panels: panel length ∝ 1 − β cos 2πt, so the end panels are (1 − β)/(1 + β) of the middle ones. */
const GRADING = 0.8;

/**
 * Maxwell capacitance matrix of the winding's nodes (with the topload joined to the top node), by an
 * axisymmetric boundary-element solve of the whole structure.
 *
 * Method: piecewise-constant charge panels with collocation at their midpoints, the ring-charge kernel
 * 2K(m)/√A and its logarithmic self-term as in {@link capacitanceAxisymmetricBEM} (J. C. Maxwell, Treatise,
 * 1873; H. Singer, H. Steinbigler, P. Weiss, IEEE Trans. PAS-93, 1974, charge simulation; both from memory),
 * a negative image for every source when there is a ground plane (Kelvin's images). The winding is a
 * cylinder at the wire centres whose potential is the hat-function interpolation of the node voltages
 * (linear within each section); the topload is at the top node's voltage; the primary's turns and the
 * strike rail are grounded thin rings whose self-potential is that of a ring of wire radius a,
 * q·ln(8R/a)/(4π²ε0R). With P the potential coefficients and B the map from node voltages to panel
 * potentials, the panel charges are q = P⁻¹BV and the node charges Bᵀq, so C = Bᵀ·diag(w)·P⁻¹B (made
 * exactly symmetric by averaging with its transpose). `chargeFactor` scales the winding's own charge (the
 * former's dielectric, see former.ts). One LU factorisation (ml-matrix) serves every right-hand side;
 * the coil-alone and topload-alone figures come from the same coefficients with the other body removed.
 */
export function structureCapacitance(
  g: StructureGeometry,
  disc: StructureDiscretisation,
  chargeFactor = 1,
): StructureCapacitance {
  const { radius, zBottom, length } = g.winding;
  if (!(radius > 0) || !(length > 0) || !Number.isFinite(zBottom)) throw new RangeError('the winding needs a positive radius and length');
  if (g.ground && !(zBottom >= 0)) throw new RangeError('the winding must not reach below the ground plane');
  const N = disc.sections;
  if (!Number.isInteger(N) || N < 2) throw new RangeError('at least two sections are needed');

  const panels: Panel[] = [];
  const windingCurve: Curve = {
    t0: zBottom,
    t1: zBottom + length,
    at(t, out) {
      out[0] = radius;
      out[1] = t;
      return 2 * Math.PI * radius;
    },
  };
  const nw = disc.windingPanels;
  let prev = zBottom;
  for (let k = 1; k <= nw; k++) {
    const t = k / nw;
    const z = zBottom + length * (t - (GRADING * Math.sin(2 * Math.PI * t)) / (2 * Math.PI));
    panels.push({ kind: 'curve', curve: windingCurve, ta: prev, h: z - prev, body: 'winding' });
    prev = z;
  }
  if (g.topload) {
    const curve = curveOf(g.topload);
    const h = (curve.t1 - curve.t0) / disc.toploadPanels;
    for (let k = 0; k < disc.toploadPanels; k++) panels.push({ kind: 'curve', curve, ta: curve.t0 + k * h, h, body: 'topload' });
  }
  for (const ring of g.rings) {
    if (!(ring.r > 0) || !(ring.wireRadius > 0) || ring.wireRadius >= ring.r) throw new RangeError('a grounded ring needs 0 < wire radius < ring radius');
    if (g.ground && !(ring.z > ring.wireRadius)) throw new RangeError('a grounded ring must be clear of the ground plane');
    panels.push({ kind: 'ring', r: ring.r, z: ring.z, a: ring.wireRadius });
  }
  const n = panels.length;

  // Collocation points, charge weights and Gauss nodes per panel.
  const tmp = new Float64Array(2);
  const colRho = new Float64Array(n);
  const colZ = new Float64Array(n);
  const colW = new Float64Array(n);
  const weight = new Float64Array(n);
  const size = new Float64Array(n);
  const nodes = RULES.map(({ x }) => ({ rho: new Float64Array(n * x.length), z: new Float64Array(n * x.length), w: new Float64Array(n * x.length) }));
  for (let j = 0; j < n; j++) {
    const p = panels[j];
    if (p.kind === 'ring') {
      colRho[j] = p.r;
      colZ[j] = p.z;
      weight[j] = 1;
      size[j] = 2 * p.a;
      continue;
    }
    colW[j] = p.curve.at(p.ta + 0.5 * p.h, tmp);
    colRho[j] = tmp[0];
    colZ[j] = tmp[1];
    let total = 0;
    let len = 0;
    for (let q = 0; q < RULES.length; q++) {
      const { x, w } = RULES[q];
      const m = x.length;
      let px = NaN;
      let pz = NaN;
      for (let k = 0; k < m; k++) {
        const wt = p.curve.at(p.ta + 0.5 * p.h * (x[k] + 1), tmp);
        nodes[q].rho[j * m + k] = tmp[0];
        nodes[q].z[j * m + k] = tmp[1];
        nodes[q].w[j * m + k] = wt * w[k] * 0.5 * p.h;
        if (q === 2) {
          total += wt * w[k] * 0.5 * p.h;
          if (k > 0) len += Math.hypot(tmp[0] - px, tmp[1] - pz);
          px = tmp[0];
          pz = tmp[1];
        }
      }
    }
    weight[j] = total;
    size[j] = len * 1.15;
  }

  // Potential coefficients: a[i][j] = potential at i from unit density on j (factor 1/(4π²ε0) taken out).
  const rows: Float64Array[] = [];
  for (let i = 0; i < n; i++) {
    const rho = colRho[i];
    const z = colZ[i];
    const row = new Float64Array(n);
    rows.push(row);
    for (let j = 0; j < n; j++) {
      const p = panels[j];
      let value = 0;
      if (p.kind === 'ring') {
        value = i === j ? ringKernel(p.r, p.z + p.a, p.r, p.z) : ringKernel(rho, z, p.r, p.z);
        if (g.ground) value -= ringKernel(rho, z, p.r, -p.z);
      } else {
        if (i === j) value = selfPanel(p.curve, p.ta, p.h, rho, z, colW[j], tmp);
        for (let image = 0; image < (g.ground ? 2 : 1); image++) {
          if (image === 0 && i === j) continue;
          const zc = image ? -colZ[j] : colZ[j];
          const d = Math.hypot(rho - colRho[j], z - zc) / size[j];
          const q = d < 3 ? 2 : d < 8 ? 1 : 0;
          const m = RULES[q].x.length;
          const R = nodes[q].rho;
          const Z = nodes[q].z;
          const W = nodes[q].w;
          let sum = 0;
          for (let k = j * m, end = k + m; k < end; k++) sum += W[k] * ringKernel(rho, z, R[k], image ? -Z[k] : Z[k]);
          value += image ? -sum : sum;
        }
      }
      row[j] = value;
    }
  }
  const A = new Matrix(rows);

  // Node voltages → panel potentials (hat functions along the winding; the topload follows node N).
  const nodeZ = new Float64Array(N + 1);
  for (let k = 0; k <= N; k++) nodeZ[k] = zBottom + (length * k) / N;
  const B = new Matrix(n, N);
  for (let j = 0; j < n; j++) {
    const p = panels[j];
    if (p.kind === 'ring') continue;
    if (p.body === 'topload') {
      B.set(j, N - 1, 1);
      continue;
    }
    const s = ((colZ[j] - zBottom) / length) * N;
    const k = Math.min(N - 1, Math.floor(s));
    const f = s - k;
    if (k >= 1) B.set(j, k - 1, 1 - f);
    B.set(j, k, f);
  }
  const chargeWeight = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const p = panels[j];
    chargeWeight[j] = FOUR_PI2_EPS0 * weight[j] * (p.kind === 'curve' && p.body === 'winding' ? chargeFactor : 1);
  }

  const maxwell = (keep: (j: number) => boolean): Float64Array => {
    const idx: number[] = [];
    for (let j = 0; j < n; j++) if (keep(j)) idx.push(j);
    const sub = idx.length === n ? A : A.selection(idx, idx);
    const rhs = idx.length === n ? B : B.selection(idx, Array.from({ length: N }, (_, k) => k));
    const U = new LuDecomposition(sub).solve(rhs);
    const C = new Float64Array(N * N);
    for (let a = 0; a < N; a++) {
      for (let b = 0; b < N; b++) {
        let sum = 0;
        for (let r = 0; r < idx.length; r++) {
          const bra = rhs.get(r, a);
          if (bra !== 0) sum += bra * chargeWeight[idx[r]] * U.get(r, b);
        }
        C[a * N + b] = sum;
      }
    }
    for (let a = 0; a < N; a++) {
      for (let b = a + 1; b < N; b++) {
        const mean = 0.5 * (C[a * N + b] + C[b * N + a]);
        C[a * N + b] = mean;
        C[b * N + a] = mean;
      }
    }
    return C;
  };

  const isTopload = (j: number) => panels[j].kind === 'curve' && (panels[j] as { body: string }).body === 'topload';
  const isWinding = (j: number) => panels[j].kind === 'curve' && (panels[j] as { body: string }).body === 'winding';
  const matrix = maxwell(() => true);
  const coilAlone = g.topload ? maxwell((j) => !isTopload(j)) : matrix;
  let toploadAlone = 0;
  if (g.topload) {
    const idx: number[] = [];
    for (let j = 0; j < n; j++) if (!isWinding(j)) idx.push(j);
    const rhs = new Matrix(idx.length, 1);
    idx.forEach((j, r) => rhs.set(r, 0, isTopload(j) ? 1 : 0));
    const u = new LuDecomposition(A.selection(idx, idx)).solve(rhs);
    idx.forEach((j, r) => {
      if (isTopload(j)) toploadAlone += chargeWeight[j] * u.get(r, 0);
    });
  }
  return { matrix, coilAlone, toploadAlone, nodeZ, panels: n };
}

/** vᵀCv for a row-major N×N matrix. */
export function quadraticForm(C: Float64Array, v: ArrayLike<number>): number {
  const N = v.length;
  let sum = 0;
  for (let a = 0; a < N; a++) {
    let row = 0;
    for (let b = 0; b < N; b++) row += C[a * N + b] * v[b];
    sum += v[a] * row;
  }
  return sum;
}
