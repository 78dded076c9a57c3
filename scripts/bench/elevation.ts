// Time of the target-coupling elevation search (elevationForCoupling) on the example designs: the best of
// 15 rounds of 30 calls each, so other load on the machine shows as little as possible. Asserts nothing.
import { parseDesign } from '../../src/lib/design';
import { exampleDesigns } from '../../src/lib/design/examples';
import { elevationForCoupling } from '../../src/solver';

export function runElevationBench(): void {
  console.log('\nelevationForCoupling: tabulated ring–sheet model + Newton on the full model (target ≤ 0.3 ms)');
  for (const ex of exampleDesigns) {
    const parsed = parseDesign(ex.design as never);
    if (!parsed.ok || !parsed.design.primary) continue;
    const d = parsed.design;
    for (const k of [0.08, 0.12, 0.18]) {
      let best = Infinity;
      let e: number | null = null;
      for (let r = 0; r < 15; r++) {
        const t0 = performance.now();
        for (let i = 0; i < 30; i++) e = elevationForCoupling(d, k);
        best = Math.min(best, (performance.now() - t0) / 30);
      }
      console.log(`  ${ex.name}, k = ${k}: ${best.toFixed(3)} ms → elevation ${e === null ? 'out of reach' : `${(e * 1000).toFixed(2)} mm`}`);
    }
  }
}
