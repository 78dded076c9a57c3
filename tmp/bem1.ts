import { capacitanceAxisymmetricBEM } from '../src/solver/topload/bem';
import { capacitanceTorusIsolated } from '../src/solver/topload/torus';
import { capacitanceSphereOverPlane, capacitanceSphere } from '../src/solver/topload/sphere';
import { EPSILON_0 } from '../src/solver/constants';
const ex = capacitanceTorusIsolated(0.3, 0.075);
console.log('series', ex*1e12, capacitanceTorusIsolated(0.225,0.075)*1e12);
for (const n of [10, 20, 40, 80, 160, 320]) {
  const t = capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.3, r: 0.075, centreZ: 0 }, { panels: n });
  const g = capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.3, r: 0.075, centreZ: 1 }, { panels: n, groundZ: 0 });
  const s = capacitanceAxisymmetricBEM({ kind: 'sphere', radius: 0.15, centreZ: 0 }, { panels: n });
  const sg = capacitanceAxisymmetricBEM({ kind: 'sphere', radius: 0.15, centreZ: 0.3 }, { panels: n, groundZ: 0 });
  const d = capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0 }, { panels: n });
  const dg = capacitanceAxisymmetricBEM({ kind: 'disk', radius: 0.1, centreZ: 0.05 }, { panels: n , groundZ: 0});
  console.log(n, (t/ex-1).toExponential(2), (g*1e12/36.02267-1).toExponential(2), (s/capacitanceSphere(0.15)-1).toExponential(2), (sg/capacitanceSphereOverPlane(0.15,0.3)-1).toExponential(2), (d/(8*EPSILON_0*0.1)-1).toExponential(2), dg*1e12);
}
let t0=performance.now(); for (let i=0;i<100;i++) capacitanceAxisymmetricBEM({ kind: 'torus', R: 0.3, r: 0.075, centreZ: 1+i*1e-3 }, { groundZ: 0 }); console.log('ms/torus ground default', (performance.now()-t0)/100);
