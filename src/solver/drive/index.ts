export type * from './types';
export { simulateBurst, fastModeOmega, BURST_STEPS_PER_PERIOD, BURST_MAX_PERIODS, type BurstOptions } from './burst';
