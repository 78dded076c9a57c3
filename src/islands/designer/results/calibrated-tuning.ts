import { createContext, useEffect, useState } from 'react';
import type { Calibration, CalibratedTuning } from '~/lib/buildsheet/calibration';
import type { DesignSI, Result } from '~/solver';

export type CalibratedTuningFn = (design: DesignSI, result: Result, calibration: Calibration) => CalibratedTuning | null;

/**
 * How the tap callout works out the tap from adopted measurements. An island gives it: the read-only viewer
 * with the function itself, the designer once it has loaded it (only designs with adopted values need it).
 */
export const CalibratedTuningContext = createContext<CalibratedTuningFn | null>(null);

/** True when the calibration holds a value that moves the tap. */
export function adoptsValues(c: Calibration | null | undefined): boolean {
  return Boolean(c && (c.loadedFrequency !== undefined || c.tankCapacitance !== undefined));
}

let loaded: CalibratedTuningFn | null = null;

/** The calibrated-tap function, loaded on first need; null until then or when `wanted` is false. */
export function useCalibratedTuning(wanted: boolean): CalibratedTuningFn | null {
  const [fn, setFn] = useState<CalibratedTuningFn | null>(() => loaded);
  useEffect(() => {
    if (!wanted || fn) return;
    let live = true;
    void import('~/lib/buildsheet/calibration').then((m) => {
      loaded = m.calibratedTuning;
      if (live) setFn(() => m.calibratedTuning);
    });
    return () => {
      live = false;
    };
  }, [wanted, fn]);
  return wanted ? fn : null;
}
