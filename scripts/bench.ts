// Prints median timings; no thresholds are asserted here (targets in the section titles).
import { parseDesign } from '../src/lib/design';
import { solve, sweep } from '../src/solver';
import type { DesignSI } from '../src/solver';
import { evaluateFieldModel } from '../src/solver/field/model';
import { evaluateSecondary } from '../src/solver/system/secondary';

interface Section {
  name: string;
  target: string;
  run: () => void;
  repeats: number;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(section: Section): { median: number; min: number } {
  for (let i = 0; i < Math.min(5, section.repeats); i++) section.run();
  const times: number[] = [];
  for (let i = 0; i < section.repeats; i++) {
    const t0 = performance.now();
    section.run();
    times.push(performance.now() - t0);
  }
  return { median: median(times), min: Math.min(...times) };
}

function benchDesign(): DesignSI {
  const parsed = parseDesign({
    secondary: { formDiameter: '4.5 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' }, elevation: '1 in' },
    topload: { shape: 'toroid', majorDiameter: '20 in', minorDiameter: '5 in', elevation: '3 in' },
    primary: { shape: 'flat', innerDiameter: '7 in', turns: 12, conductorDiameter: '0.25 in', spacing: '0.25 in' },
    tank: { capacitance: '20 nF' },
    supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA', lineFrequency: '60 Hz', breakRate: '120 Hz' },
  });
  if (!parsed.ok) throw new Error('bench design is invalid');
  return parsed.design;
}

const design = benchDesign();
let n = 0;
const sections: Section[] = [
  {
    name: 'solve: 1000-turn secondary, 12-turn flat primary, toroid, coupling, tap (topload memoised)',
    target: '< 2 ms',
    repeats: 200,
    run: () => void solve(design),
  },
  {
    name: 'solve: same design, topload geometry new each run (no memo hit)',
    target: 'for information',
    repeats: 50,
    run: () => void solve({ ...design, groundClearance: 0.5 + 1e-6 * ++n }),
  },
  {
    name: 'field model: 1000-turn secondary, toroid, 12-turn grounded primary, new geometry each run (BEM + ladder + modes)',
    target: 'median ≤ 30 ms',
    repeats: 40,
    run: () => {
      const d = { ...design, groundClearance: 0.5 + 1e-6 * ++n };
      void evaluateFieldModel(d, evaluateSecondary(d.secondary).inductance);
    },
  },
  {
    name: 'field model: same geometry, tank and streamer allowance changed (cached matrices, one small eigenproblem)',
    target: 'for information',
    repeats: 200,
    run: () => void evaluateFieldModel({ ...design, tank: { kind: 'single', capacitance: 1e-8 * (1 + (++n % 7)) } }, evaluateSecondary(design.secondary).inductance).frequencyWithTopCapacitance(1e-12 * (n % 5)),
  },
  {
    name: 'sweep: 200 points of secondary.turns, default series (f, L, C_self, k)',
    target: '< 300 ms',
    repeats: 10,
    run: () => void sweep({ ...design, groundClearance: 0.5 + 1e-6 * ++n }, 'secondary.turns', 600, 1400, 200),
  },
];

for (const s of sections) {
  const r = time(s);
  console.log(`${s.name}\n  median ${r.median.toFixed(3)} ms, min ${r.min.toFixed(3)} ms (target ${s.target}, ${s.repeats} runs)`);
}

{
  const { runElevationBench } = await import('./bench/elevation');
  runElevationBench();
}

{
  const { runBurstBench } = await import('./bench/burst');
  runBurstBench();
}

// The page-weight and keystroke figures need a build to serve.
{
  const { existsSync } = await import('node:fs');
  const { spawnSync } = await import('node:child_process');
  const dist = process.env.COILWRIGHT_DIST || 'dist';
  if (!existsSync(`${dist}/server/entry.mjs`)) {
    console.log(`building into ${dist}/ for the page benchmarks…`);
    spawnSync(process.execPath, ['node_modules/astro/astro.js', 'build', '--outDir', dist], { stdio: 'ignore' });
  }
  const { runDesignerBench } = await import('./bench/designer');
  await runDesignerBench();
}

// Throughput of the API and pages against a bare node:http server, in the same run.
{
  const { runApiBench } = await import('./bench/api');
  await runApiBench();
}
