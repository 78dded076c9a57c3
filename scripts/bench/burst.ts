// Time of one bridge-driven burst (simulateBurst): a dual-resonant coil with its secondary at 100 kHz and a
// 200 µs on-time, median and 90th percentile of 200 runs after a warm-up. Asserts nothing.
// Alone: npx tsx scripts/bench/burst.ts
import { pathToFileURL } from 'node:url';
import { onTimeForPeakCurrent, simulateBurst, type BurstCircuitSI, type DriveSettingsSI } from '../../src/solver';

const lcCapacitance = (L: number, f: number) => 1 / ((2 * Math.PI * f) ** 2 * L);

const settings: DriveSettingsSI = {
  topology: 'dual-resonant',
  bridge: 'full',
  busVoltage: 340,
  onTime: 200e-6,
  repetitionRate: 200,
  switchPeakCurrent: 1000,
  currentLimit: 600,
  busCapacitance: 3.3e-3,
  tuningRatio: 0.92,
};
const circuit: BurstCircuitSI = {
  L1: 10e-6,
  C1: lcCapacitance(10e-6, 92e3),
  R1: 0.1,
  L2: 50e-3,
  C2: lcCapacitance(50e-3, 100e3),
  R2: 80,
  M: 0.15 * Math.sqrt(10e-6 * 50e-3),
};

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
}

function timeRuns(run: () => void, repeats: number): { median: number; p90: number } {
  for (let i = 0; i < 20; i++) run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { median: percentile(times, 0.5), p90: percentile(times, 0.9) };
}

export function runBurstBench(): void {
  const r = simulateBurst(settings, circuit);
  const burst = timeRuns(() => void simulateBurst(settings, circuit), 200);
  console.log(
    `\nburst simulation, 200 µs on-time at 100 kHz (dual-resonant, full bridge, k = 0.15; ${r.switchingInstants.length} switchings, ` +
      `${r.stepsPerPeriod} steps per period, peak ${r.peakPrimaryCurrent.toFixed(0)} A)\n` +
      `  median ${burst.median.toFixed(3)} ms, p90 ${burst.p90.toFixed(3)} ms (target median ≤ 10 ms, 200 runs)`,
  );
  const goal = timeRuns(() => void onTimeForPeakCurrent(settings, circuit, 500), 30);
  console.log(`onTimeForPeakCurrent, same coil, 500 A (one burst to 1 ms)\n  median ${goal.median.toFixed(3)} ms, p90 ${goal.p90.toFixed(3)} ms (for information, 30 runs)`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) runBurstBench();
