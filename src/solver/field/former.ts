import type { FormerMaterial, FormerSI } from '../types';

/**
 * Relative permittivity of common coil-form materials at 0.1–1 MHz (typical handbook values, from memory;
 * real pipes vary with the compound and the moisture they hold, by about ±10 %).
 */
export const FORMER_PERMITTIVITY: Readonly<Record<FormerMaterial, number>> = {
  air: 1,
  pvc: 3.0,
  acrylic: 2.7,
  polyethylene: 2.3,
  polystyrene: 2.55,
  cardboard: 2.0,
};

/**
 * The former assumed when a design names none: a thin-walled PVC pipe, εr 3.0, 3 mm wall (a typical thin-wall
 * drain pipe, from memory; stated to the user as an assumption).
 */
export const DEFAULT_FORMER: Readonly<FormerSI> = { material: 'pvc', permittivity: FORMER_PERMITTIVITY.pvc, wallThickness: 3e-3, assumed: true };

/**
 * Effective relative permittivity of the space inside the winding.
 *
 * Inside a long winding whose potential rises along its length the field is mostly axial, so a pipe wall
 * and the air core it surrounds act as permittivities in parallel, weighted by their share of the cross
 * section: ε_in = 1 + (εr − 1)·(1 − (1 − t/a)²), with a the form's outer radius and t the wall. A solid rod
 * (t = a) gives εr, as for R. G. Medhurst's polystyrene rods (Wireless Engineer 24, 1947). This is a
 * simple, stated treatment, not a field solution of the dielectric: the radial field near the wire, which
 * sees the wall more strongly, is left out, so a thin wall is if anything under-weighted.
 * Domain: permittivity ≥ 1, 0 ≤ wall ≤ form radius.
 * @example innerPermittivity({ material: 'pvc', permittivity: 3, wallThickness: 0.003, assumed: false }, 0.05715) // ≈ 1.2
 */
export function innerPermittivity(former: FormerSI, formRadius: number): number {
  if (!(former.permittivity >= 1) || !Number.isFinite(former.permittivity)) throw new RangeError('former permittivity must be at least 1');
  const t = Math.min(Math.max(former.wallThickness, 0), formRadius);
  const hollow = 1 - t / formRadius;
  return 1 + (former.permittivity - 1) * (1 - hollow * hollow);
}

/**
 * Share of an isolated winding's self-capacitance that belongs to the field inside it, from D. W. Knight's
 * form C ∝ 1 + k_c(1 + ε_in/ε_out)/2 with k_c = 0.717439(D/ℓ) + 0.933048(D/ℓ)^1.5 + 0.106(D/ℓ)² ("The
 * self-resonance and self-capacitance of solenoid coils", v0.04, 2013, §§2–4; structure confirmed,
 * coefficients from memory): with an air core the inside holds (k_c/2)/(1 + k_c) of it.
 * @example insideShare(0.5) // ≈ 0.13 for ℓ/D = 2
 */
export function insideShare(diameterOverLength: number): number {
  const r = diameterOverLength;
  const kc = 0.717439 * r + 0.933048 * Math.pow(r, 1.5) + 0.106 * r * r;
  return kc / (2 * (1 + kc));
}

/**
 * Factor by which the former raises the winding's own charge: 1 + share·(ε_in − 1), applied to the charge the
 * field model finds on the winding's surface (the inside share of its field is filled with ε_in).
 */
export function formerChargeFactor(former: FormerSI, formRadius: number, diameterOverLength: number): number {
  return 1 + insideShare(diameterOverLength) * (innerPermittivity(former, formRadius) - 1);
}
