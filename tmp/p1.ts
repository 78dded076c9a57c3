import { inductancePrimary, inductancePrimaryWheeler, mutualInductanceLoops } from '../src/solver/primary/inductance';
import { primaryConductorLength, primaryRings } from '../src/solver/primary/geometry';
import { mutualInductanceRingSheet, mutualPrimarySecondary } from '../src/solver/coupling/mutual';
import { inductanceSolenoidRoundWire, inductanceSolenoidLorenz, rosaCorrection } from '../src/solver/secondary/inductance';
import { toploadCapacitance } from '../src/solver/topload/bem';
const base = { innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 };
console.log('flat', inductancePrimary({ ...base, shape: 'flat' }) * 1e6, inductancePrimary({ ...base, shape: 'flat' }, 12, false) * 1e6, inductancePrimaryWheeler({ ...base, shape: 'flat' })! * 1e6);
console.log('cone', inductancePrimary({ ...base, shape: 'conical', angle: Math.PI / 6 }) * 1e6);
console.log('helix', inductancePrimary({ ...base, shape: 'helical', innerDiameter: 0.3 }) * 1e6, inductancePrimaryWheeler({ ...base, shape: 'helical', innerDiameter: 0.3 })! * 1e6);
console.log('rosa', (inductanceSolenoidLorenz(12, 0.15, 0.1524) - rosaCorrection(12, 0.15, 0.0127, 0.00635, false)) * 1e6);
console.log('len', primaryConductorLength({ ...base, shape: 'flat' }), primaryRings({ ...base, shape: 'flat' }).reduce((s, r) => s + 2 * Math.PI * r.r, 0));
// ring-sheet vs filament sum
const N = 1000, R = 0.05, z0 = 0.01, len = 0.5;
for (const [rr, zr] of [[0.2, 0], [0.05, 0.2], [0.0501, 0.3], [0.07, 0.005]]) {
  let fs = 0; for (let i = 0; i < N; i++) fs += mutualInductanceLoops(rr, R, z0 + (i + 0.5) * len / N - zr);
  const sh = mutualInductanceRingSheet(rr, zr, R, z0, len, N);
  console.log('ring', rr, zr, sh, fs, sh / fs - 1);
}
const rings = primaryRings({ ...base, shape: 'flat' });
let t0 = performance.now(); let acc = 0;
for (let i = 0; i < 1000; i++) acc += mutualPrimarySecondary(rings, { radius: 0.05 + i * 1e-9, z0: 0.01, length: 0.5, turns: 1000 });
console.log('mutualPrimarySecondary ms', (performance.now() - t0) / 1000);
t0 = performance.now();
for (let i = 0; i < 1000; i++) acc += inductancePrimary({ ...base, shape: 'flat', spacing: 0.00635 + i * 1e-9 });
console.log('inductancePrimary ms', (performance.now() - t0) / 1000);
t0 = performance.now();
for (let i = 0; i < 200; i++) acc += toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75 + i * 1e-6, minorDiameter: 0.15, centreHeightAboveGround: 1 });
console.log('toploadCapacitance ms (uncached)', (performance.now() - t0) / 200);
t0 = performance.now();
for (let i = 0; i < 200; i++) acc += toploadCapacitance({ shape: 'sphere', diameter: 0.3 + i * 1e-6, centreHeightAboveGround: 1 });
console.log('toploadCapacitance sphere ms (uncached)', (performance.now() - t0) / 200);
t0 = performance.now();
for (let i = 0; i < 10000; i++) acc += toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75, minorDiameter: 0.15, centreHeightAboveGround: 1 });
console.log('toploadCapacitance ms (cached)', (performance.now() - t0) / 10000);
console.log(toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75, minorDiameter: 0.15, centreHeightAboveGround: 1 }) * 1e12, acc > 0);
