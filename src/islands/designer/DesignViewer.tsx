import { issueText } from '~/lib/design/labels';
import { useCallback, useEffect, useMemo, useState } from 'react';
import type { DesignInput } from '~/lib/design';
import type { DesignIssue, DesignSI, Result } from '~/solver';
import { solverClient } from './solver-client';
import type { UnitSystem } from '~/lib/format';
import { calibratedTuning, type Calibration } from '~/lib/buildsheet/calibration';
import { CalibratedTuningContext } from './results/calibrated-tuning';
import { CoilDrawing } from '../drawing/CoilDrawing';
import { ResultsPanel } from './results/ResultsPanel';
import { ChartsPanel } from './ChartsPanel';
import { UnitSwitch } from './UnitSwitch';

export type DesignViewerProps = {
  name: string;
  design: DesignInput;
  result: Result | null;
  unitSystem?: UnitSystem;
  /** values adopted on the bench; the tap shown is calibrated by them */
  calibration?: Calibration | null;
  /** the design already resolved into SI (by the page's server): the viewer then starts no solver worker to read it */
  designSI?: DesignSI | null;
};

/** The viewer's content: the stored design read into SI, its drawing, results and charts. */
function DesignViewerView({ name, design, result, unitSystem = 'metric', calibration = null, designSI }: DesignViewerProps) {
  const [system, setSystem] = useState<UnitSystem>(unitSystem);
  const inputKey = useMemo(() => JSON.stringify(design), [design]);
  const readInput = useCallback(() => design, [design]);
  // the worker resolves the stored input into SI for the drawing and the charts
  const given = useMemo(() => (designSI ? { ok: true as const, design: designSI } : null), [designSI]);
  const [resolved, setParsed] = useState<{ ok: true; design: DesignSI } | { ok: false; issues: DesignIssue[] } | null>(null);
  const parsed = given ?? resolved;
  useEffect(() => {
    if (given) return;
    let live = true;
    void solverClient()
      .request({ type: 'solve', input: design })
      .then((r) => {
        if (!live) return;
        if (r.ok && r.reply.type === 'solve') setParsed({ ok: true, design: r.reply.data.design });
        else if (!r.ok) setParsed({ ok: false, issues: r.issues });
      });
    return () => {
      live = false;
    };
  }, [design, given]);
  if (!result || (parsed && !parsed.ok)) {
    return (
      <p className="cw-alert" role="status">
        “{name}” can no longer be computed: {parsed && !parsed.ok ? parsed.issues.map((i) => issueText(i)).join('; ') : 'the solver gave no result'}.
      </p>
    );
  }
  if (!parsed) {
    return (
      <div className="space-y-6" data-testid="design-viewer">
        <ResultsPanel result={result} system={system} />
      </div>
    );
  }
  return (
    <div className="space-y-6" data-testid="design-viewer">
      <UnitSwitch value={system} onChange={setSystem} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <section className="cw-card self-start" aria-labelledby="viewer-drawing">
          <h2 id="viewer-drawing" className="mb-2 text-lg font-semibold">
            Side section
          </h2>
          <CoilDrawing design={parsed.design} result={result} system={system} />
        </section>
        <section aria-labelledby="viewer-results" className="space-y-3">
          <h2 id="viewer-results" className="text-lg font-semibold">
            Results
          </h2>
          <ResultsPanel result={result} system={system} calibration={calibration} design={parsed.design} />
        </section>
      </div>
      <ChartsPanel design={parsed.design} input={readInput} inputKey={inputKey} system={system} />
    </div>
  );
}

/** A saved design, read-only: drawing, results and charts, no inputs. For share links and build sheets. */
export default function DesignViewer(props: DesignViewerProps) {
  return (
    <CalibratedTuningContext.Provider value={calibratedTuning}>
      <DesignViewerView {...props} />
    </CalibratedTuningContext.Provider>
  );
}

export { DesignViewer };
