import type { ResponseResult } from '../types';
import { energyExchange, type CoupledPair } from './exchange';
import { splitFrequencies, transferTime } from './modes';

// integrating further than this many half-cycles costs more than a solve should; the closed form remains
const MAX_HALF_CYCLES_INTEGRATED = 2000;

/**
 * Split frequencies and transfer time of the tuned primary–secondary pair (f0/√(1±k); "Electronics"
 * lecture notes §2.7, confirmed; P. Drude, Ann. Phys. 13, 1904, from memory), and the
 * first primary-energy minimum from integrating the lossless pair (it differs from the envelope null
 * by up to a quarter cycle).
 */
export function evaluateResponse(pair: CoupledPair): ResponseResult {
  const f0 = 1 / (2 * Math.PI * Math.sqrt(Math.sqrt(pair.L1 * pair.C1 * pair.L2 * pair.C2)));
  const { fLow, fHigh } = splitFrequencies(f0, pair.k);
  const t1 = transferTime(f0, pair.k);
  const halfCycles = 2 * f0 * t1;
  let firstPrimaryMinimum: number | null = null;
  let residualPrimaryEnergy: number | null = null;
  if (pair.k > 0 && halfCycles <= MAX_HALF_CYCLES_INTEGRATED) {
    const run = energyExchange(pair, { duration: 1.6 * t1, points: 2, stepsPerCycle: 96 });
    firstPrimaryMinimum = run.firstPrimaryMinimum;
    residualPrimaryEnergy = run.residualPrimaryEnergy;
  }
  return { f0, k: pair.k, fLow, fHigh, transferTime: t1, firstPrimaryMinimum, residualPrimaryEnergy, halfCyclesToTransfer: halfCycles };
}
