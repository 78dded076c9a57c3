import * as e from '../src/solver/math/ellip';
import * as g from '../src/solver/math/gauss';
import * as ls from '../src/solver/math/linsolve';
import * as pc from '../src/solver/math/pchip';
import * as awg from '../src/solver/wire/awg';
import * as ins from '../src/solver/wire/insulation';
import * as ms from '../src/solver/wire/mass';
import * as wl from '../src/solver/wire/length';
import * as res from '../src/solver/wire/resistance';
import * as si from '../src/solver/secondary/inductance';
import * as sc from '../src/solver/secondary/capacitance';
import * as sr from '../src/solver/secondary/resonance';
import * as sp from '../src/solver/topload/sphere';
import * as to from '../src/solver/topload/torus';
import * as bem from '../src/solver/topload/bem';
import * as pg from '../src/solver/primary/geometry';
import * as pi from '../src/solver/primary/inductance';
import * as cm from '../src/solver/coupling/mutual';
const P = { shape: 'flat' as const, innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 };
const out: Record<string, unknown> = {
  ellipKE: e.ellipKE(0.5), comp: e.ellipKEComplementary(1e-20).K, kme: e.ellipKMinusE(1e-10), kc: e.ellipKComplementary(0.5), mx: e.ellipMaxwellCombination(1e-8, 1 - 1e-8),
  gl2: g.gaussLegendre(2), ig: g.integrateGauss((t) => t * t, 0, 1, 4), sd: ls.solveDense(Float64Array.of(2, 1, 1, 3), Float64Array.of(3, 5), 2), pchip: pc.pchip([0, 1, 2], [0, 1, 4])(1.5),
  awg24: awg.awgDiameter(24), awgInv: awg.awgFromDiameter(0.127e-3), ins: ins.insulatedDiameter(awg.awgDiameter(24), 'heavy'), insA: ins.insulatedDiameterAwg(24, 'bare'),
  mass: ms.copperMass(1000, 1.1283792e-3), hl: wl.helixWireLength(1000, 0.1, 0.5), cr: res.copperResistance(1, 1.1283792e-3), sd100: res.skinDepth(100e3), ser: res.skinEffectRatio(1e-3, 1e6), ac: res.acResistanceRoundWire(1, 1e-3, 1e6),
  nag1: si.nagaokaCoefficient(1), lor: si.inductanceSolenoidLorenz(1000, 0.05, 0.5), B10: si.rosaCorrectionB(10), A: si.rosaCorrectionA(1e-3, 1e-3, false), rc: si.rosaCorrection(12, 0.15, 0.0127, 0.00635, false), rw: si.inductanceSolenoidRoundWire(12, 0.15, 0.1524, 0.00635), w28: si.inductanceSolenoidWheeler1928(12, 0.15, 0.1524), w82: si.inductanceSolenoidWheeler1982(1000, 0.05, 0.5),
  med: sc.selfCapacitanceMedhurst(0.1, 0.5), kn: sc.selfCapacitanceKnight(0.1, 0.5), f: sr.resonantFrequencyLC(0.0177, 20e-12), qw: sr.quarterWaveFrequency(300), Q: sr.qualityFactor(0.0177, 100, 250e3),
  cs: sp.capacitanceSphere(0.15), csp: sp.capacitanceSphereOverPlane(0.15, 1.0), ct: to.capacitanceTorusIsolated(0.3, 0.075), P0: to.legendrePHalf(0, Math.acosh(3)), Q0: to.legendreQHalf(0, Math.acosh(3)), emp: to.capacitanceToroidEmpirical(0.75, 0.15),
  disk: bem.capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0 }), tl: bem.toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75, minorDiameter: 0.15, centreHeightAboveGround: 1 }),
  rings: pg.primaryRings({ ...P, turns: 2 }), tapw: pg.primaryRingsAtTap(P, 1.5).map((r) => r.weight), hlen: pg.primaryConductorLength({ ...P, shape: 'helical', innerDiameter: 0.3 }), od: pg.primaryOuterDiameter(P),
  loop: pi.inductanceLoopRoundWire(0.15, 0.003175), M: pi.mutualInductanceLoops(0.1, 0.1, 0.01), Lp: pi.inductancePrimary(P), fsw: pi.inductanceFlatSpiralWheeler(0.16985, 12, 0.1524), pw: pi.inductancePrimaryWheeler({ ...P, shape: 'helical', innerDiameter: 0.3 }),
  rs: cm.mutualInductanceRingSheet(0.2, 0, 0.05, 0.01, 0.5, 1000), mps: cm.mutualPrimarySecondary([{ r: 0.2, z: 0 }], { radius: 0.05, z0: 0.01, length: 0.5, turns: 1000 }), k: cm.couplingCoefficient(1e-5, 5e-5, 0.02),
};
console.log(out);
