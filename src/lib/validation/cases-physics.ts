import { EPSILON_0, MU_0 } from '../../solver/constants';
import { mutualInductanceRingSheet } from '../../solver/coupling/mutual';
import {
  inductanceFlatSpiralWheeler,
  inductanceLoopRoundWire,
  inductancePrimary,
  mutualInductanceLoops,
} from '../../solver/primary/inductance';
import { selfCapacitanceKnight, selfCapacitanceMedhurst } from '../../solver/secondary/capacitance';
import {
  inductanceSolenoidLorenz,
  inductanceSolenoidWheeler1928,
  inductanceSolenoidWheeler1982,
  nagaokaCoefficient,
  rosaCorrection,
  rosaCorrectionB,
} from '../../solver/secondary/inductance';
import { resonantFrequencyLC } from '../../solver/secondary/resonance';
import { capacitanceAxisymmetricBEM, toploadCapacitance } from '../../solver/topload/bem';
import { capacitanceSphereOverPlane } from '../../solver/topload/sphere';
import { capacitanceToroidEmpirical, capacitanceTorusIsolated } from '../../solver/topload/torus';
import { awgDiameter } from '../../solver/wire/awg';
import { copperMass } from '../../solver/wire/mass';
import { copperResistance, skinDepth, skinEffectRatio } from '../../solver/wire/resistance';
import lib from './fixtures/physics-library.json';
import worked from './fixtures/worked-examples.json';
import { defineCase, q } from './inputs';
import type { ReferenceCase } from './types';

const LIB = `scipy ${lib.libraries.scipy}, mpmath ${lib.libraries.mpmath} (${lib.generator})`;
const NAGAOKA_TABLE =
  'E. B. Rosa & F. W. Grover, "Formulas and tables for the calculation of mutual and self-inductance", Bull. Bur. Stand. 8(1), 1912; F. W. Grover, "Inductance Calculations", 1946 — Nagaoka coefficient table, 4 decimals (from memory)';
const ROSA_TABLE =
  'E. B. Rosa, "Calculation of the self-inductance of single-layer coils", Bull. Bur. Stand. 2(2), 1906 — table of the B correction (from memory)';
const MEDHURST =
  'R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer solenoids", Wireless Engineer 24, 1947 — table of H (rows ℓ/D = 1–5 confirmed by a secondary transcription)';
const ASTM = 'ASTM B258, "Standard nominal diameters … of AWG sizes of solid round wires", tabulated diameters (4 s.f.)';
const IEC = 'IEC 60028 (1925), "International standard of resistance for copper" (from memory)';
const WORKED = `scipy ${worked.libraries.scipy}, mpmath ${worked.libraries.mpmath}, numpy ${worked.libraries.numpy} (${worked.generator})`;
const RING_MODEL = `Ring model: Kirchhoff's loop formula for each turn plus Neumann's integral by scipy.integrate.quad for each pair (the Maxwell/Kirchhoff summation of F. W. Grover, "Inductance Calculations", 1946, from memory), independent computation — ${WORKED}`;
const WHEELER_INCH = `the printed inch formula evaluated in inches, independent computation — ${WORKED}`;
const ringPrimary = (shape: string) => {
  const found = worked.ringPrimaries.find((p) => p.shape === shape);
  if (!found) throw new Error(`worked-examples.json has no ${shape} primary`);
  return found;
};

/** The ring-model primaries: the fields of a PrimaryGeometry, as the solver receives them. */
const primaryInputs = { innerDiameter: q(0.2, 'm'), turns: 12, conductorDiameter: q(6.35, 'mm'), spacing: q(6.35, 'mm'), elevation: q(0, 'm') };

function nagaokaCase(dOverL: number, table: number): ReferenceCase {
  return defineCase({
    id: `nagaoka-coefficient-${dOverL}`,
    quantity: 'Nagaoka coefficient',
    method: 'secondary-inductance',
    source: NAGAOKA_TABLE,
    kind: 'published-table',
    inputs: { diameterOverLength: dOverL },
    reference: table,
    unit: '1',
    tolerance: 0.5e-4 / table + 1e-9,
    compute: (x) => nagaokaCoefficient(x.diameterOverLength),
  });
}

function rosaCase(turns: number, table: number): ReferenceCase {
  return defineCase({
    id: `rosa-b-${turns}`,
    quantity: 'Rosa mutual-inductance correction B',
    method: 'secondary-inductance',
    source: `${ROSA_TABLE}; computed by D. W. Knight's series (2010, coefficients from memory)`,
    kind: 'published-table',
    inputs: { turns },
    reference: table,
    unit: '1',
    tolerance: 0.5e-4 / table + 1e-9,
    compute: (x) => rosaCorrectionB(x.turns),
  });
}

function medhurstCase(lOverD: number, H: number): ReferenceCase {
  const D = 0.1;
  return defineCase({
    id: `medhurst-h-${lOverD}`,
    quantity: 'Secondary self-capacitance',
    method: 'secondary-capacitance',
    source: MEDHURST,
    kind: 'published-table',
    inputs: { diameter: q(D, 'm'), lengthOverDiameter: lOverD },
    // H is tabulated in pF per cm of diameter
    reference: H * D * 100,
    unit: 'pF',
    tolerance: 1e-9,
    compute: (x) => selfCapacitanceMedhurst(x.diameter, x.lengthOverDiameter * x.diameter).capacitance * 1e12,
  });
}

function awgCase(gauge: number, mm: number): ReferenceCase {
  return defineCase({
    id: `awg-${gauge}`,
    quantity: 'Bare wire diameter',
    method: 'wire',
    source: ASTM,
    kind: 'published-table',
    inputs: { awg: gauge },
    reference: mm,
    unit: 'mm',
    tolerance: 2e-4,
    compute: (x) => awgDiameter(x.awg) * 1e3,
  });
}

export const physicsCases: ReferenceCase[] = [
  nagaokaCase(0.2, 0.9201),
  nagaokaCase(1, 0.6884),
  nagaokaCase(10, 0.2033),
  rosaCase(2, 0.1137),
  rosaCase(5, 0.218),
  rosaCase(10, 0.2664),
  ...lib.lorenzQuadrature.map(
    (c): ReferenceCase => defineCase({
      id: `lorenz-sheet-${c.turns}-${c.r}-${c.length}`,
      quantity: 'Secondary inductance (current sheet)',
      method: 'secondary-inductance',
      source: `Sheet integral of Neumann's filament mutual inductance, L = (N/ℓ)²·2∫(ℓ−u)M(r,r,u)du, by mpmath.quad — ${LIB}`,
      kind: 'library',
      inputs: { turns: c.turns, radius: q(c.r, 'm'), length: q(c.length, 'm') },
      reference: c.L * 1e3,
      unit: 'mH',
      tolerance: 1e-9,
      compute: (x) => inductanceSolenoidLorenz(x.turns, x.radius, x.length) * 1e3,
    }),
  ),
  defineCase({
    id: 'rosa-corrected-helix',
    quantity: 'Secondary inductance (round wire, Rosa)',
    method: 'secondary-inductance',
    source: `E. B. Rosa, "Calculation of the self-inductance of single-layer coils", Bull. Bur. Stand. 2(2), 1906 (from memory): Lorenz − μ0rN(A + B), low-frequency A; sheet by mpmath quadrature of Neumann's integral, B from its GMD definition by scipy.integrate.dblquad, independent computation — ${WORKED}`,
    kind: 'library',
    inputs: { turns: 12, radius: q(0.15, 'm'), pitch: q(12.7, 'mm'), wireDiameter: q(6.35, 'mm'), highFrequency: false },
    reference: worked.rosaHelix.L * 1e6,
    unit: 'µH',
    tolerance: 1e-6,
    // winding length = turns × pitch
    compute: (x) => (inductanceSolenoidLorenz(x.turns, x.radius, x.turns * x.pitch) - rosaCorrection(x.turns, x.radius, x.pitch, x.wireDiameter, x.highFrequency)) * 1e6,
  }),
  defineCase({
    id: 'wheeler-1928-helix',
    quantity: 'Secondary inductance (Wheeler 1928)',
    method: 'secondary-inductance',
    source: `H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928, a²n²/(9a + 10b) (from memory); ${WHEELER_INCH}`,
    kind: 'closed-form',
    inputs: { turns: 12, radius: q(0.15, 'm'), length: q(0.1524, 'm') },
    reference: worked.wheelerSolenoid.L * 1e6,
    unit: 'µH',
    tolerance: 2e-4,
    compute: (x) => inductanceSolenoidWheeler1928(x.turns, x.radius, x.length) * 1e6,
  }),
  defineCase({
    id: 'wheeler-1982-vs-nagaoka',
    quantity: 'Nagaoka coefficient (Wheeler 1982)',
    method: 'secondary-inductance',
    source: `${NAGAOKA_TABLE}; Wheeler's 1982 formula claims about 0.1 % (from memory)`,
    kind: 'published-table',
    inputs: { turns: 100, radius: q(0.1, 'm'), length: q(0.2, 'm', { note: 'diameter over length 1' }) },
    reference: 0.6884,
    unit: '1',
    tolerance: 1e-3,
    // the coefficient is L over the long-solenoid inductance μ0πr²N²/ℓ
    compute: (x) => inductanceSolenoidWheeler1982(x.turns, x.radius, x.length) / ((MU_0 * Math.PI * x.radius ** 2 * x.turns ** 2) / x.length),
  }),
  medhurstCase(1, 0.46),
  medhurstCase(3, 0.61),
  medhurstCase(5, 0.81),
  defineCase({
    id: 'knight-vs-medhurst-2',
    quantity: 'Secondary self-capacitance (Knight)',
    method: 'secondary-capacitance',
    source: `${MEDHURST}; D. W. Knight, "The self-resonance and self-capacitance of solenoid coils", 2013 (coefficients from memory), polystyrene core εi = 2.5`,
    kind: 'published-table',
    inputs: { diameter: q(0.1, 'm'), lengthOverDiameter: 2, innerPermittivity: 2.5 },
    reference: 0.5 * 10,
    unit: 'pF',
    tolerance: 0.05,
    compute: (x) => selfCapacitanceKnight(x.diameter, x.lengthOverDiameter * x.diameter, { innerPermittivity: x.innerPermittivity }) * 1e12,
  }),
  awgCase(30, 0.2546),
  awgCase(22, 0.6438),
  awgCase(10, 2.588),
  defineCase({
    id: 'copper-resistance-1mm2',
    quantity: 'DC resistance',
    method: 'wire',
    source: `${IEC}: 1/58 Ω·mm²/m at 20 °C`,
    kind: 'closed-form',
    inputs: { length: q(1, 'm'), area: q(1, 'mm²'), temperature: q(20, '°C', { as: '°C' }) },
    reference: 1 / 58,
    unit: 'Ω',
    tolerance: 1e-4,
    // the solver takes the diameter of a round wire of that cross-section
    compute: (x) => copperResistance(x.length, Math.sqrt((4 * x.area) / Math.PI), x.temperature),
  }),
  defineCase({
    id: 'copper-mass-1km-1mm2',
    quantity: 'Wire mass',
    method: 'wire',
    source: `${IEC}: density 8.89 g/cm³`,
    kind: 'closed-form',
    inputs: { length: q(1, 'km'), area: q(1, 'mm²') },
    reference: 8.89,
    unit: 'kg',
    tolerance: 1e-12,
    compute: (x) => copperMass(x.length, Math.sqrt((4 * x.area) / Math.PI)),
  }),
  defineCase({
    id: 'skin-depth-100k',
    quantity: 'Skin depth',
    method: 'wire',
    source: `δ = √(ρ/(π f μ0)) (S. Ramo, J. R. Whinnery & T. Van Duzer, "Fields and Waves in Communication Electronics", 3rd ed., 1994, §3.16, from memory) with ρ = 1/58 Ω·mm²/m (${IEC}): 0.2090 mm`,
    kind: 'closed-form',
    inputs: { frequency: q(100, 'kHz') },
    reference: 0.209,
    unit: 'mm',
    tolerance: 5e-4,
    compute: (x) => skinDepth(x.frequency) * 1e3,
  }),
  defineCase({
    id: 'skin-depth-1M',
    quantity: 'Skin depth',
    method: 'wire',
    source: `δ = √(ρ/(π f μ0)) (S. Ramo, J. R. Whinnery & T. Van Duzer, "Fields and Waves in Communication Electronics", 3rd ed., 1994, §3.16, from memory) with ρ = 1/58 Ω·mm²/m (${IEC}): 66.09 µm`,
    kind: 'closed-form',
    inputs: { frequency: q(1, 'MHz') },
    reference: 66.09,
    unit: 'µm',
    tolerance: 2e-4,
    compute: (x) => skinDepth(x.frequency) * 1e6,
  }),
  ...lib.skinEffectRatio.slice(1, 3).map(
    (c): ReferenceCase => defineCase({
      id: `skin-effect-${c.diameter}-${c.f}`,
      quantity: 'AC/DC resistance ratio (skin effect)',
      method: 'wire',
      source: `Re[(ka/2)J0(ka)/J1(ka)], k = (1 − i)/δ, with scipy.special.jv — ${LIB}`,
      kind: 'library',
      inputs: { diameter: q(c.diameter * 1e3, 'mm'), frequency: q(c.f / 1e3, 'kHz') },
      reference: c.ratio,
      unit: '1',
      tolerance: 1e-9,
      compute: (x) => skinEffectRatio(x.diameter, x.frequency),
    }),
  ),
  defineCase({
    id: 'sphere-isolated-bem',
    quantity: 'Topload capacitance (sphere)',
    method: 'topload-capacitance',
    source: 'C = 4πε0a, isolated sphere (standard closed form)',
    kind: 'closed-form',
    inputs: { radius: q(0.15, 'm'), ground: 'none' },
    reference: 4 * Math.PI * EPSILON_0 * 0.15 * 1e12,
    unit: 'pF',
    tolerance: 1e-5,
    compute: (x) => capacitanceAxisymmetricBEM({ kind: 'sphere', radius: x.radius, centreZ: 0 }) * 1e12,
  }),
  defineCase({
    id: 'disk-isolated-bem',
    quantity: 'Topload capacitance (disk)',
    method: 'topload-capacitance',
    source: 'C = 8ε0a, isolated thin disk: J. D. Jackson, "Classical Electrodynamics", 3rd ed., 1999, §3.13 (from memory)',
    kind: 'closed-form',
    inputs: { radius: q(0.1, 'm'), ground: 'none' },
    reference: 8 * EPSILON_0 * 0.1 * 1e12,
    unit: 'pF',
    tolerance: 1e-5,
    compute: (x) => capacitanceAxisymmetricBEM({ kind: 'disk', radius: x.radius, centreZ: 0 }) * 1e12,
  }),
  defineCase({
    id: 'torus-over-ground-bem',
    quantity: 'Topload capacitance (toroid over ground)',
    method: 'topload-capacitance',
    source: `Charge simulation with ring charges and ground images (H. Singer, H. Steinbigler & P. Weiss, "A charge simulation method for the calculation of high voltage fields", IEEE Trans. PAS-93, 1974, from memory), scipy.special.ellipk kernel and numpy least squares, independent computation — ${WORKED}`,
    kind: 'library',
    inputs: { R: q(0.3, 'm'), r: q(0.075, 'm'), centreHeight: q(1.0, 'm') },
    reference: worked.torusOverGround.C * 1e12,
    unit: 'pF',
    tolerance: 1e-4,
    compute: (x) => capacitanceAxisymmetricBEM({ kind: 'torus', R: x.R, r: x.r, centreZ: x.centreHeight }, { groundZ: 0 }) * 1e12,
  }),
  defineCase({
    id: 'sphere-over-ground',
    quantity: 'Topload capacitance (sphere over ground)',
    method: 'topload-capacitance',
    source: `Kelvin's method of images, successive image charges summed with mpmath — ${LIB}; W. R. Smythe, "Static and Dynamic Electricity", 3rd ed., 1968, ch. 5 (from memory)`,
    kind: 'library',
    inputs: { radius: q(lib.sphereOverPlane[1].a, 'm'), centreHeight: q(lib.sphereOverPlane[1].h, 'm') },
    reference: lib.sphereOverPlane[1].C * 1e12,
    unit: 'pF',
    tolerance: 1e-12,
    compute: (x) => capacitanceSphereOverPlane(x.radius, x.centreHeight) * 1e12,
  }),
  defineCase({
    id: 'topload-sphere-over-ground-bem',
    quantity: 'Topload capacitance (sphere over ground)',
    method: 'topload-capacitance',
    source: `Kelvin's method of images with mpmath — ${LIB}`,
    kind: 'library',
    inputs: { diameter: q(2 * lib.sphereOverPlane[0].a, 'm'), centreHeight: q(lib.sphereOverPlane[0].h, 'm') },
    reference: lib.sphereOverPlane[0].C * 1e12,
    unit: 'pF',
    tolerance: 1e-4,
    compute: (x) => toploadCapacitance({ shape: 'sphere', diameter: x.diameter, centreHeightAboveGround: x.centreHeight }) * 1e12,
  }),
  defineCase({
    id: 'topload-toroid-outside-diameter',
    quantity: 'Topload capacitance (toroid, outside-diameter convention)',
    method: 'topload-capacitance',
    source: `Toroidal-harmonic series (DLMF §14.19; W. R. Smythe, "Static and Dynamic Electricity", 3rd ed., 1968, from memory), mpmath legenp/legenq — ${LIB}`,
    kind: 'library',
    inputs: { majorDiameter: q(0.6, 'm', { note: 'outside' }), minorDiameter: q(0.15, 'm'), ground: 'none' },
    reference: lib.torusSeries[1].C * 1e12,
    unit: 'pF',
    tolerance: 1e-4,
    compute: (x) => toploadCapacitance({ shape: 'toroid', majorDiameter: x.majorDiameter, minorDiameter: x.minorDiameter, centreHeightAboveGround: null }) * 1e12,
  }),
  defineCase({
    id: 'torus-series-0.3',
    quantity: 'Topload capacitance (isolated torus)',
    method: 'topload-capacitance',
    source: `Toroidal-harmonic series (DLMF §14.19; W. R. Smythe, "Static and Dynamic Electricity", 3rd ed., 1968, from memory), mpmath legenp/legenq — ${LIB}`,
    kind: 'library',
    inputs: { R: q(0.3, 'm'), r: q(0.075, 'm') },
    reference: lib.torusSeries[0].C * 1e12,
    unit: 'pF',
    tolerance: 2e-7,
    compute: (x) => capacitanceTorusIsolated(x.R, x.r) * 1e12,
  }),
  defineCase({
    id: 'torus-series-fat',
    quantity: 'Topload capacitance (isolated torus)',
    method: 'topload-capacitance',
    source: `Toroidal-harmonic series with mpmath legenp/legenq — ${LIB}`,
    kind: 'library',
    inputs: { R: q(lib.torusSeries[3].R, 'm'), r: q(lib.torusSeries[3].r, 'm') },
    reference: lib.torusSeries[3].C * 1e12,
    unit: 'pF',
    tolerance: 1e-12,
    compute: (x) => capacitanceTorusIsolated(x.R, x.r) * 1e12,
  }),
  defineCase({
    id: 'toroid-empirical',
    quantity: 'Topload capacitance (trade toroid formula)',
    method: 'topload-capacitance',
    source: `Common practice: the trade's empirical toroid formula, compared with the exact isolated torus (toroidal-harmonic series, mpmath — ${LIB}); loose check`,
    kind: 'common-practice',
    inputs: { majorDiameter: q(0.75, 'm', { note: 'outside' }), minorDiameter: q(0.15, 'm') },
    reference: lib.torusSeries[0].C * 1e12,
    unit: 'pF',
    tolerance: 0.1,
    compute: (x) => capacitanceToroidEmpirical(x.majorDiameter, x.minorDiameter) * 1e12,
  }),
  ...lib.loopAtGmd.slice(0, 1).flatMap((c): ReferenceCase[] => [
    defineCase({
      id: 'loop-hf',
      quantity: 'Loop inductance (high frequency)',
      method: 'primary-inductance',
      source: `Neumann's integral for two filaments at the wire's GMD (a), by scipy.integrate.quad — ${LIB}`,
      kind: 'library',
      inputs: { loopRadius: q(c.R, 'm'), wireRadius: q(c.wireRadius * 1e3, 'mm'), highFrequency: true },
      reference: c.MhfAtA * 1e6,
      unit: 'µH',
      tolerance: 3e-4,
      compute: (x) => inductanceLoopRoundWire(x.loopRadius, x.wireRadius, x.highFrequency) * 1e6,
    }),
    defineCase({
      id: 'loop-lf',
      quantity: 'Loop inductance (low frequency)',
      method: 'primary-inductance',
      source: `Neumann's integral for two filaments at the wire's GMD (a·e^(−1/4)), by scipy.integrate.quad — ${LIB}`,
      kind: 'library',
      inputs: { loopRadius: q(c.R, 'm'), wireRadius: q(c.wireRadius * 1e3, 'mm'), highFrequency: false },
      reference: c.MlfAtGmd * 1e6,
      unit: 'µH',
      tolerance: 3e-4,
      compute: (x) => inductanceLoopRoundWire(x.loopRadius, x.wireRadius, x.highFrequency) * 1e6,
    }),
  ]),
  ...lib.maxwellMutual.slice(0, 3).map(
    (c, i): ReferenceCase => defineCase({
      id: `maxwell-mutual-${i + 1}`,
      quantity: 'Mutual inductance of coaxial circles',
      method: 'mutual-inductance',
      source: `Neumann's integral by scipy.integrate.quad — ${LIB}; J. C. Maxwell, "A Treatise on Electricity and Magnetism", 1873, vol. 2, art. 701`,
      kind: 'library',
      inputs: { a: q(c.a, 'm'), b: q(c.b, 'm'), d: q(c.d, 'm') },
      reference: c.M * 1e9,
      unit: 'nH',
      tolerance: 1e-11,
      compute: (x) => mutualInductanceLoops(x.a, x.b, x.d) * 1e9,
    }),
  ),
  defineCase({
    id: 'primary-flat',
    quantity: 'Primary inductance (flat spiral)',
    method: 'primary-inductance',
    source: RING_MODEL,
    kind: 'library',
    inputs: primaryInputs,
    reference: ringPrimary('flat').Lhf * 1e6,
    unit: 'µH',
    tolerance: 1e-4,
    compute: (x) => inductancePrimary({ shape: 'flat', ...x }) * 1e6,
  }),
  defineCase({
    id: 'primary-cone-30',
    quantity: 'Primary inductance (30° cone)',
    method: 'primary-inductance',
    source: RING_MODEL,
    kind: 'library',
    inputs: { ...primaryInputs, angle: q(30, 'deg') },
    reference: ringPrimary('conical30').Lhf * 1e6,
    unit: 'µH',
    tolerance: 1e-4,
    compute: (x) => inductancePrimary({ shape: 'conical', ...x }) * 1e6,
  }),
  defineCase({
    id: 'primary-helix',
    quantity: 'Primary inductance (helix)',
    method: 'primary-inductance',
    source: RING_MODEL,
    kind: 'library',
    inputs: { ...primaryInputs, innerDiameter: q(0.3, 'm') },
    reference: ringPrimary('helical').Lhf * 1e6,
    unit: 'µH',
    tolerance: 1e-4,
    compute: (x) => inductancePrimary({ shape: 'helical', ...x }) * 1e6,
  }),
  defineCase({
    id: 'wheeler-flat-spiral',
    quantity: 'Primary inductance (Wheeler flat spiral)',
    method: 'primary-inductance',
    source: `H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928, flat spiral a²N²/(8a + 11c) (from memory); ${WHEELER_INCH}`,
    kind: 'closed-form',
    inputs: { meanRadius: q(0.16985, 'm'), turns: 12, radialWidth: q(0.1524, 'm') },
    reference: worked.wheelerSpiral.L * 1e6,
    unit: 'µH',
    tolerance: 2e-4,
    compute: (x) => inductanceFlatSpiralWheeler(x.meanRadius, x.turns, x.radialWidth) * 1e6,
  }),
  ...lib.ringSheet.slice(0, 2).map(
    (c, i): ReferenceCase => defineCase({
      id: `ring-sheet-mutual-${i + 1}`,
      quantity: 'Primary–secondary mutual inductance (ring and sheet)',
      method: 'coupling',
      source: `(N/ℓ)∫ Neumann M dz, nested mpmath.quad — ${LIB}`,
      kind: 'library',
      inputs: { ringRadius: q(c.ringR, 'm'), ringHeight: q(c.ringZ, 'm'), sheetRadius: q(c.sheetRadius, 'm'), sheetBottom: q(c.z0, 'm'), sheetLength: q(c.length, 'm'), turns: c.turns },
      reference: c.M * 1e6,
      unit: 'µH',
      tolerance: 1e-8,
      compute: (x) => mutualInductanceRingSheet(x.ringRadius, x.ringHeight, x.sheetRadius, x.sheetBottom, x.sheetLength, x.turns) * 1e6,
    }),
  ),
  defineCase({
    id: 'lc-resonance',
    quantity: 'Resonant frequency',
    method: 'resonance',
    source: 'Thomson\'s formula f = 1/(2π√(LC)) (standard closed form)',
    kind: 'closed-form',
    inputs: { L: q(1, 'mH'), C: q(1, 'nF') },
    reference: 1 / (2 * Math.PI * 1e-6),
    unit: 'Hz',
    tolerance: 1e-14,
    compute: (x) => resonantFrequencyLC(x.L, x.C),
  }),
];
