export type * from './types';
export { simulateBurst, fastModeOmega, BURST_STEPS_PER_PERIOD, BURST_MAX_PERIODS, type BurstOptions } from './burst';
export {
  onTimeForPeakCurrent,
  tankCapacitanceForPeakCurrent,
  ON_TIME_SEARCH_LIMIT,
  type OnTimeGoal,
  type TankGoal,
} from './goals';
