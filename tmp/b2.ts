import { toploadCapacitance, capacitanceAxisymmetricBEM } from '../src/solver/topload/bem';
let acc = 0;
for (let rep = 0; rep < 3; rep++) {
  let t0 = performance.now();
  for (let i = 0; i < 1000; i++) acc += toploadCapacitance({ shape: 'toroid', majorDiameter: 0.75 + (rep * 1000 + i) * 1e-7, minorDiameter: 0.15, centreHeightAboveGround: 1 });
  console.log('toroid ms', (performance.now() - t0) / 1000);
  t0 = performance.now();
  for (let i = 0; i < 1000; i++) acc += toploadCapacitance({ shape: 'sphere', diameter: 0.3 + (rep * 1000 + i) * 1e-7, centreHeightAboveGround: 1 });
  console.log('sphere ms', (performance.now() - t0) / 1000);
}
