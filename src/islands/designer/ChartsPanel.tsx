import { lazy, memo, Suspense, useDeferredValue, useEffect, useRef, useState } from 'react';
import type { DesignSI } from '~/solver';
import type { UnitSystem } from '~/lib/format';
import type { ChartsData } from '../../workers/protocol';
import { solverClient } from './solver-client';
import { SweepPanel } from './SweepPanel';
import { WhenVisible } from './WhenVisible';

const TuningChart = lazy(() => import('../charts/TuningChart'));
const CouplingChart = lazy(() => import('../charts/CouplingChart'));
const ExchangeChart = lazy(() => import('../charts/ExchangeChart'));
const BurstChart = lazy(() => import('../charts/BurstChart'));
const PeakCurrentChart = lazy(() => import('../charts/PeakCurrentChart'));

type Props = {
  design: DesignSI;
  /** the design as the API takes it, read when a chart or a sweep is computed */
  input: () => unknown;
  /** changes whenever the design does: the charts are computed again */
  inputKey: string;
  system: UnitSystem;
  showSweep?: boolean;
};

const loading = <p className="text-sm text-ink-soft">Loading the chart…</p>;

function useChartsData(input: () => unknown, key: string): ChartsData | null {
  const [data, setData] = useState<ChartsData | null>(null);
  const seq = useRef(0);
  const inputRef = useRef(input);
  inputRef.current = input;
  useEffect(() => {
    const mine = ++seq.current;
    const t = setTimeout(async () => {
      const r = await solverClient().request({ type: 'charts', input: inputRef.current() });
      if (mine === seq.current && r.ok && r.reply.type === 'charts') setData(r.reply.data);
    }, 300);
    return () => clearTimeout(t);
  }, [key]);
  return data;
}

function Charts({ input, inputKey, system }: { input: () => unknown; inputKey: string; system: UnitSystem }) {
  const data = useChartsData(input, inputKey);
  if (!data) return loading;
  return (
    <Suspense fallback={loading}>
      <div className="grid gap-4 lg:grid-cols-2">
        {data.burst && (
          <>
            <section className="cw-card lg:col-span-2" aria-labelledby="chart-burst">
              <h3 id="chart-burst" className="mb-2 text-base font-semibold">
                The burst: primary current and secondary voltage
              </h3>
              <BurstChart curve={data.burst} />
            </section>
            <section className="cw-card lg:col-span-2" aria-labelledby="chart-peak">
              <h3 id="chart-peak" className="mb-2 text-base font-semibold">
                Peak primary current against on-time
              </h3>
              <PeakCurrentChart curve={data.burst} />
            </section>
          </>
        )}
        <section className="cw-card" aria-labelledby="chart-tuning">
          <h3 id="chart-tuning" className="mb-2 text-base font-semibold">
            Tuning: primary frequency against the tap
          </h3>
          {data.tuning ? <TuningChart curve={data.tuning} /> : <p className="text-sm text-ink-soft">Needs a primary and a tank capacitor.</p>}
        </section>
        <section className="cw-card" aria-labelledby="chart-coupling">
          <h3 id="chart-coupling" className="mb-2 text-base font-semibold">
            Coupling against secondary elevation
          </h3>
          {data.coupling ? <CouplingChart curve={data.coupling} system={system} /> : <p className="text-sm text-ink-soft">Needs a primary.</p>}
        </section>
        {!data.burst && (
        <section className="cw-card lg:col-span-2" aria-labelledby="chart-exchange">
          <h3 id="chart-exchange" className="mb-2 text-base font-semibold">
            Energy exchange between primary and secondary
          </h3>
          {data.exchange ? <ExchangeChart curve={data.exchange} /> : <p className="text-sm text-ink-soft">Needs a primary tuned to the secondary (a tap within reach) and a tank capacitor.</p>}
        </section>
        )}
      </div>
    </Suspense>
  );
}

/** The charts below the results, loaded only when the builder scrolls down to them. */
export const ChartsPanel = memo(function ChartsPanel({ design: given, input, inputKey, system, showSweep = true }: Props) {
  // the results beside the form update first; the sweep's ranges follow in a render of their own
  const design = useDeferredValue(given);
  return (
    <section aria-labelledby="charts-title" className="space-y-4">
      <h2 id="charts-title" className="text-xl font-semibold">
        Charts
      </h2>
      {showSweep && <SweepPanel design={design} input={input} system={system} />}
      <WhenVisible>
        <Charts input={input} inputKey={inputKey} system={system} />
      </WhenVisible>
    </section>
  );
});
