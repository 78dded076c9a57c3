import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, inverse, solve } from 'ml-matrix';
import { MU_0 } from '../constants';
import { nagaokaCoefficient } from '../secondary/inductance';

/**
 * Inductance matrix of a single-layer winding cut into `sections` equal sections, H, row-major.
 *
 * Each section is a stretch of the winding's uniform current sheet; with G(s) the Lorenz self-inductance of
 * a sheet of length s at the same turn density (H. Nagaoka 1909; L. Lorenz 1879; both from memory), the
 * mutual inductance of the stretches [z1, z2] and [z3, z4] is ½[G(z4 − z1) + G(z3 − z2) − G(z3 − z1) − G(z4 − z2)]
 * (inclusion–exclusion on the sheet's self-inductance; reduces to Maxwell's filament mutuals when integrated,
 * REFERENCES a1). The matrix sums to G(ℓ); `totalInductance` (the secondary's round-wire value) is matched by
 * spreading the difference evenly over the diagonal, as Rosa's per-turn corrections are.
 */
export function sectionInductanceMatrix(turns: number, radius: number, length: number, sections: number, totalInductance: number): Float64Array {
  const N = sections;
  const h = length / N;
  const density = turns / length;
  const G = (s: number) => (s <= 0 ? 0 : (MU_0 * Math.PI * radius * radius * (density * s) ** 2 * nagaokaCoefficient((2 * radius) / s)) / s);
  const g = Array.from({ length: N + 1 }, (_, k) => G(k * h));
  const L = new Float64Array(N * N);
  const byDistance = new Float64Array(N);
  byDistance[0] = g[1];
  for (let d = 1; d < N; d++) byDistance[d] = 0.5 * (g[d + 1] + g[d - 1] - 2 * g[d]);
  for (let i = 0; i < N; i++) for (let j = 0; j < N; j++) L[i * N + j] = byDistance[Math.abs(i - j)];
  const correction = (totalInductance - g[N]) / N;
  for (let i = 0; i < N; i++) L[i * N + i] += correction;
  return L;
}

export interface LadderModes {
  /** angular frequencies² of the modes, lowest first */
  omega2: number[];
  /** node voltages of the first mode (nodes 1…N), top = 1 */
  voltage: Float64Array;
  /** section currents of the first mode, relative (the largest |I| = 1) */
  current: Float64Array;
  /** V·C·V with the first mode's profile (top = 1): the capacitance that stores the same energy at the top voltage */
  effectiveCapacitance: number;
  effectiveInductance: number;
}

/**
 * Normal modes of the winding as a ladder of coupled sections: (Dᵀ L⁻¹ D) V = ω² C V, with D the node-to-section
 * difference matrix ((DV)ⱼ = Vⱼ − Vⱼ₋₁, V₀ = 0 at the grounded base), L the section inductance matrix and C the
 * nodes' Maxwell capacitance matrix (REFERENCES g; the loaded helical line of Corum & Corum 2001, from memory).
 * Solved as the symmetric problem G⁻¹(DᵀL⁻¹D)G⁻ᵀ y = ω² y with C = GGᵀ (Cholesky) and V = G⁻ᵀy, by ml-matrix's
 * symmetric eigenvalue decomposition. `topCapacitance` is added between the top node and ground (a streamer
 * allowance). The equivalent lumped pair at the top has C_eff = VᵀCV/V_top² and L_eff = 1/(ω₁²C_eff).
 */
export function ladderModes(L: Float64Array, C: Float64Array, sections: number, topCapacitance = 0, count = 3): LadderModes {
  const N = sections;
  const Lm = Matrix.from1DArray(N, N, L);
  const Cm = Matrix.from1DArray(N, N, C);
  if (topCapacitance) Cm.set(N - 1, N - 1, Cm.get(N - 1, N - 1) + topCapacitance);
  const D = new Matrix(N, N);
  for (let j = 0; j < N; j++) {
    D.set(j, j, 1);
    if (j > 0) D.set(j, j - 1, -1);
  }
  const LinvD = solve(Lm, D);
  const K = D.transpose().mmul(LinvD);
  const chol = new CholeskyDecomposition(Cm);
  if (!chol.isPositiveDefinite()) throw new RangeError('the capacitance matrix is not positive definite');
  const Ginv = inverse(chol.lowerTriangularMatrix);
  const M = Ginv.mmul(K).mmul(Ginv.transpose());
  // exact symmetry for the symmetric solver
  for (let a = 0; a < N; a++) for (let b = a + 1; b < N; b++) {
    const mean = 0.5 * (M.get(a, b) + M.get(b, a));
    M.set(a, b, mean);
    M.set(b, a, mean);
  }
  const evd = new EigenvalueDecomposition(M, { assumeSymmetric: true });
  const values = evd.realEigenvalues;
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  const first = order[0];
  const y = evd.eigenvectorMatrix.getColumnVector(first);
  const Vm = Ginv.transpose().mmul(y);
  const top = Vm.get(N - 1, 0);
  const voltage = new Float64Array(N);
  for (let k = 0; k < N; k++) voltage[k] = Vm.get(k, 0) / top;
  const Vn = Matrix.columnVector(Array.from(voltage));
  const Iv = LinvD.mmul(Vn);
  let peak = 0;
  for (let k = 0; k < N; k++) peak = Math.max(peak, Math.abs(Iv.get(k, 0)));
  const current = new Float64Array(N);
  for (let k = 0; k < N; k++) current[k] = Math.abs(Iv.get(k, 0)) / peak;
  const effectiveCapacitance = Vn.transpose().mmul(Cm).mmul(Vn).get(0, 0);
  const omega2 = order.slice(0, count).map((i) => values[i]);
  return { omega2, voltage, current, effectiveCapacitance, effectiveInductance: 1 / (omega2[0] * effectiveCapacitance) };
}
