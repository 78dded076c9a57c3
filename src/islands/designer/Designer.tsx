import { lazy, Suspense, useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { primaryInnerDefault } from '~/lib/design/defaults';
import { FormProvider, useForm, useWatch, type UseFormReturn } from 'react-hook-form';
import { withApi } from '~/lib/api/provider';
import type { DesignInput } from '~/lib/design';
import { formatFixed, formatQuantity, lengthInputText, type UnitSystem } from '~/lib/format';
import type { DesignRole } from '~/lib/permissions';
import type { Calibration } from '~/lib/buildsheet/calibration';
import type { SolverWarning } from '~/solver';
import type { Goal, GoalAnswer } from '../../workers/protocol';
import { proposeTank, type TankForm } from '~/lib/design/tank-goal';
import { readSimpleQuantity } from '~/lib/format';
import type { GoalApplied } from './GoalPanel';
import { FieldFeedbackContext, FieldFeedbackStore, fieldId, type FieldFeedback } from './form/field-context';
import { SecondaryPart, ToploadPart, PrimaryPart, TankPart, SupplyPart, TuningPart } from './form/parts';
import { designResolver } from './form/resolver';
import { convertLengths, emptyValues, fromDesignInput, toDesignInput, type FormValues } from './form/values';
import { ChartsPanel } from './ChartsPanel';
import { DraftNotes } from './DraftNotes';
import { GoalPanel } from './GoalPanel';
import { ResultsAside } from './ResultsAside';
import { adoptsValues, CalibratedTuningContext, useCalibratedTuning } from './results/calibrated-tuning';
import { SaveBar } from './SaveBar';
import { UnitSwitch } from './UnitSwitch';
import { useDesignSave } from './use-design-save';
import { useDraft } from './use-draft';
import { useLeaveGuard } from './use-leave-guard';
import { useLiveSolve } from './use-live-solve';
import { useSaveShortcut } from './use-save-shortcut';
import { useUnitSystem } from './use-unit-system';

export type DesignerProps = {
  signedIn: boolean;
  unitSystem: UnitSystem;
  /** the saved design being edited; absent on /designs/new */
  record?: { id: string; name: string; design: DesignInput; revision: number; role: DesignRole } | null;
  /** where a new design starts: an example, or null for a draft or a blank design */
  start?: { name: string; design: DesignInput } | null;
  signInHref?: string;
  /** values adopted on the bench; the tap shown is calibrated by them */
  calibration?: Calibration | null;
};

function getPath(o: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((v, k) => (v && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined), o);
}

// shown only when a save meets a newer revision: loaded then
const ConflictDialog = lazy(() => import('./ConflictDialog').then((m) => ({ default: m.ConflictDialog })));

const keyOf = (v: FormValues) => JSON.stringify([v.name.trim(), toDesignInput(v)]);

const NO_ISSUES: never[] = [];
const NO_WARNINGS: SolverWarning[] = [];

/** Plain data that keeps its identity while its content (compared as JSON) stays the same. */
function useSameContent<T>(value: T): T {
  const key = JSON.stringify(value);
  return useMemo(() => JSON.parse(key) as T, [key]);
}

/** The form's own error messages by path: what the fields show, as a text that changes only when they do. */
function errorMessages(errors: unknown, prefix = '', out: string[] = []): string[] {
  if (!errors || typeof errors !== 'object') return out;
  const e = errors as Record<string, unknown>;
  if (typeof e.message === 'string') out.push(`${prefix}\u0000${e.message}`);
  for (const [k, v] of Object.entries(e)) {
    if (k !== 'ref' && k !== 'message' && k !== 'type' && v && typeof v === 'object') errorMessages(v, prefix ? `${prefix}.${k}` : k, out);
  }
  return out;
}

type GoalPath =
  | 'secondary.turns'
  | 'secondary.elevation'
  | 'tuning.targetCoupling'
  | 'tank.mode'
  | 'tank.capacitance'
  | 'tank.series'
  | 'tank.parallel'
  | 'supply.onTime'
  | 'supply.tuningRatio';

/** The tank as the goal helper sees it: its form (none, one capacitor, a bank) and the bank's units. */
function tankForm(t: FormValues['tank']): TankForm {
  if (t.mode === 'single') return { mode: 'single', capacitance: t.capacitance };
  if (t.mode === 'none') return { mode: 'none' };
  const unit = readSimpleQuantity(t.unitCapacitance);
  const voltage = readSimpleQuantity(t.unitVoltage);
  const series = Number(t.series);
  const parallel = Number(t.parallel);
  if (!unit || unit.unit.kind !== 'capacitance' || !Number.isInteger(series) || !Number.isInteger(parallel) || series < 1 || parallel < 1) {
    return { mode: 'bank', unitCapacitance: NaN, unitCapacitanceText: t.unitCapacitance, unitVoltage: voltage?.value ?? NaN, series: 1, parallel: 1 };
  }
  return { mode: 'bank', unitCapacitance: unit.value, unitCapacitanceText: t.unitCapacitance.trim(), unitVoltage: voltage?.value ?? NaN, series, parallel };
}

function startValues(props: DesignerProps): FormValues {
  const { record, start, unitSystem } = props;
  if (record) return fromDesignInput(record.design, record.name, unitSystem);
  if (start) return fromDesignInput(start.design, start.name, unitSystem);
  return emptyValues(unitSystem);
}

function DesignerInner(props: DesignerProps) {
  // the values the form opened with; later props never reset a form being edited
  const [initial] = useState(() => startValues(props));
  const form = useForm<FormValues>({ defaultValues: initial, resolver: designResolver, mode: 'onSubmit', reValidateMode: 'onChange' });
  // The form's context is given here, above the component that watches every value: the context stays the same
  // object while the builder types, so the fields render again only for what concerns them.
  return (
    <FormProvider {...form}>
      <DesignerBody {...props} initial={initial} form={form} />
    </FormProvider>
  );
}

function DesignerBody(props: DesignerProps & { initial: FormValues; form: UseFormReturn<FormValues> }) {
  const { signedIn, unitSystem, record = null, start, signInHref = '/sign-in?next=%2Fdesigns%2Fnew', initial, form } = props;
  const editing = record !== null;
  const readOnly = record?.role === 'viewer';
  const [baseline, setBaseline] = useState<FormValues>(initial);

  const { control, getValues, reset, setValue, formState, handleSubmit } = form;
  const values = useWatch({ control }) as FormValues;
  const input = useMemo(() => toDesignInput(values), [values]);
  const inputKey = useMemo(() => JSON.stringify(input), [input]);
  const currentKey = useMemo(() => JSON.stringify([values.name.trim(), input]), [values.name, input]);
  const { live, last, pending, retry } = useLiveSolve(input, inputKey);

  const units = useUnitSystem(unitSystem, signedIn);
  const system = units.system;
  const draft = useDraft({ designId: record?.id ?? null, fromExample: Boolean(start), unitSystem, form, currentKey });

  // what "no unsaved changes" compares with: the last saved values, or the values the page started from
  const [saved, setSaved] = useState<FormValues | null>(editing ? initial : null);
  const savedKey = useMemo(() => keyOf(saved ?? baseline), [saved, baseline]);
  const dirty = currentKey !== savedKey;
  const guard = useLeaveGuard(dirty && (editing || signedIn) && !readOnly);
  const save = useDesignSave({
    record,
    signedIn,
    readOnly,
    system,
    reset,
    onSaved: setSaved,
    allowLeave: guard.allow,
    keepAside: draft.keepAside,
    clearNewDraft: draft.clearNew,
  });

  // the primary's innermost turn follows the form until the builder types one of their own
  const untouchedInner = useRef<string | null>(initial.primary.enabled ? null : initial.primary.innerDiameter);
  const formText = values.secondary.formDiameter;
  const innerText = values.primary.innerDiameter;
  useEffect(() => {
    if (untouchedInner.current === null || innerText !== untouchedInner.current) {
      untouchedInner.current = null;
      return;
    }
    const next = primaryInnerDefault(formText, system);
    if (next && next !== innerText) {
      untouchedInner.current = next;
      setValue('primary.innerDiameter', next);
    }
  }, [formText, innerText, system, setValue]);

  const { clearServerIssues } = save;
  useEffect(() => clearServerIssues(), [inputKey, clearServerIssues]);

  const serverIssues = save.serverIssues;
  // the same messages as before keep the same arrays, so the form's fields do not render again for every result
  const liveIssues = useSameContent(live.status === 'invalid' ? live.issues : NO_ISSUES);
  const warnings = useSameContent<SolverWarning[]>(live.status === 'ok' ? live.result.warnings : NO_WARNINGS);
  // the form's own errors can change in place: they are read by their messages, so the feedback changes when
  // they do; each field renders again only when its own messages change (`FieldFeedbackStore`)
  const errors = formState.errors;
  const errorsKey = errorMessages(errors).join('\u0001');
  const feedback = useMemo<FieldFeedback>(
    () => ({
      errorFor: (path) =>
        serverIssues.find((i) => i.path === path)?.message ??
        liveIssues.find((i) => i.path === path)?.message ??
        (getPath(errors, path) as { message?: string } | undefined)?.message,
      warningsFor: (path) => warnings.filter((w) => w.path === path),
      readOnly,
    }),
    // errorsKey stands for the content of `errors`
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [serverIssues, liveIssues, warnings, errorsKey, readOnly],
  );
  const [feedbackStore] = useState(() => new FieldFeedbackStore(feedback));
  useLayoutEffect(() => feedbackStore.set(feedback), [feedbackStore, feedback]);

  const submit = handleSubmit(save.onValid, save.onInvalid);
  useSaveShortcut(() => void submit());

  const { convert: convertAside } = draft;
  const { choose } = units;
  const switchUnits = useCallback(
    (next: UnitSystem) => {
      if (next === system) return;
      const converted = convertLengths(getValues(), next);
      if (untouchedInner.current !== null) untouchedInner.current = converted.primary.innerDiameter;
      reset(converted);
      setSaved((s) => (s ? convertLengths(s, next) : s));
      setBaseline((s) => convertLengths(s, next));
      convertAside(next);
      choose(next);
    },
    [system, reset, getValues, convertAside, choose],
  );

  /** Writes a goal's answer into the form and says exactly what changed, with a way to put it back. */
  function writeGoal(a: GoalAnswer, goal: Goal): GoalApplied {
    const opts = { shouldDirty: true, shouldValidate: formState.isSubmitted };
    const writes: Array<[GoalPath, string]> = [];
    let message = '';
    if (a.kind === 'frequency') {
      const turns = String(Math.max(1, Math.round(a.turns)));
      writes.push(['secondary.turns', turns]);
      message = `Secondary turns ${getValues('secondary.turns')} → ${turns} (winding ${formatQuantity(a.windingLength, 'length', { system })}).`;
    }
    if (a.kind === 'tap') {
      const proposal = proposeTank(a.capacitance, tankForm(getValues('tank')));
      if (!proposal.ok) return { ok: false, message: proposal.message };
      for (const c of proposal.changes) writes.push([c.path, c.path === 'tank.mode' ? 'single' : c.to]);
      message = proposal.message;
    }
    if (a.kind === 'onTime') {
      const onTime = `${Number((a.onTime * 1e6).toPrecision(3))} us`;
      writes.push(['supply.onTime', onTime]);
      message = `On-time ${getValues('supply.onTime') || '(default)'} → ${onTime}.`;
    }
    if (a.kind === 'tankForCurrent') {
      // the tank keeps its form: a bank gets strings and units that give the value, or the helper says it cannot
      const proposal = proposeTank(a.capacitance, tankForm(getValues('tank')));
      if (!proposal.ok) return { ok: false, message: proposal.message };
      for (const c of proposal.changes) writes.push([c.path, c.path === 'tank.mode' ? 'single' : c.to]);
      message = `${proposal.message} Surge impedance about ${formatQuantity(a.surgeImpedance, 'resistance', { digits: 3 })}; the tap follows.`;
    }
    if (a.kind === 'tapRatio' && goal.kind === 'tapRatio') {
      writes.push(['supply.tuningRatio', String(goal.ratio)]);
      message = `Primary-to-secondary tuning ratio ${getValues('supply.tuningRatio') || '(default)'} → ${goal.ratio}: tap at ${formatFixed(a.tapTurns, 2)} turns.`;
    }
    if (a.kind === 'coupling' && goal.kind === 'coupling') {
      const elevation = lengthInputText(a.elevation, system, 4);
      writes.push(['secondary.elevation', elevation], ['tuning.targetCoupling', String(goal.k)]);
      message = `Winding bottom above primary plane ${getValues('secondary.elevation') || '0'} → ${elevation}; Target coupling k set to ${goal.k}.`;
    }
    const before = writes.map(([path]) => [path, getValues(path)] as [GoalPath, string]);
    for (const [path, value] of writes) setValue(path, value as never, opts);
    return { ok: true, message, undo: () => before.forEach(([path, value]) => setValue(path, value as never, opts)) };
  }

  // the goal panel keeps one callback and reads the design when it runs, so typing does not render it again
  const latest = useRef({ writeGoal, input });
  useEffect(() => {
    latest.current = { writeGoal, input };
  });
  const applyGoal = useCallback((a: GoalAnswer, goal: Goal) => latest.current.writeGoal(a, goal), []);
  const currentInput = useCallback(() => latest.current.input, []);

  function bringBack() {
    if (draft.bringBack()) save.setStatus('Your version is back; save to keep it as the newest revision.');
  }

  function startOver() {
    draft.startOver();
    const v = emptyValues(system);
    reset(v);
    setBaseline(v);
  }

  // with adopted bench values the tap is worked out from them: the results wait for that code (loaded only then)
  const calibratedTuning = useCalibratedTuning(adoptsValues(props.calibration));
  const ready = !adoptsValues(props.calibration) || calibratedTuning !== null;
  const shown = useMemo(() => (!ready ? null : live.status === 'ok' ? { design: live.design, result: live.result } : last), [live, last, ready]);
  const nameError = feedback.errorFor('name');

  return (
    <CalibratedTuningContext.Provider value={calibratedTuning}>
      <FieldFeedbackContext.Provider value={feedbackStore}>
        <div className="space-y-6">
          <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
            <div className="space-y-4">
              <form onSubmit={submit} noValidate aria-label="Design" className="space-y-4">
                <div className="cw-card space-y-3">
                  <div>
                    <label htmlFor={fieldId('name')} className="cw-label">
                      Design name
                    </label>
                    <input
                      id={fieldId('name')}
                      className="cw-input"
                      autoComplete="off"
                      readOnly={readOnly}
                      aria-invalid={nameError ? true : undefined}
                      aria-describedby={nameError ? `${fieldId('name')}-error` : undefined}
                      {...form.register('name')}
                    />
                    {nameError && (
                      <p id={`${fieldId('name')}-error`} className="cw-field-error">
                        {nameError}
                      </p>
                    )}
                  </div>
                  <UnitSwitch value={system} onChange={switchUnits} note={units.note} />
                  <SaveBar signedIn={signedIn} editing={editing} readOnly={readOnly} saving={save.saving} dirty={dirty} revision={save.revision} signInHref={signInHref} />
                  <div role="alert" className={save.formError ? 'cw-alert' : undefined}>
                    {save.formError}
                  </div>
                  <div role="status" className={save.status ? 'cw-success' : 'sr-only'}>
                    {save.status}
                  </div>
                  <DraftNotes draftNote={draft.note} onStartOver={startOver} hasSetAside={draft.setAside !== null} onBringBack={bringBack} onDiscard={draft.discardAside} />
                </div>
                <SecondaryPart system={system} />
                <ToploadPart system={system} />
                <PrimaryPart system={system} />
                <TankPart />
                <SupplyPart />
                <TuningPart system={system} />
              </form>
              <GoalPanel input={currentInput} system={system} hasPrimary={values.primary.enabled} hasTank={values.tank.mode !== 'none'} bridge={values.supply.kind === 'solid-state'} readOnly={readOnly} apply={applyGoal} />
            </div>
            <ResultsAside live={live} pending={pending} shown={shown} system={system} onRetry={retry} calibration={props.calibration ?? null} />
          </div>
          {shown && <ChartsPanel design={shown.design} input={currentInput} inputKey={inputKey} system={system} />}
        </div>
        {save.conflict && (
          <Suspense fallback={null}>
            <ConflictDialog onReload={save.reloadLatest} onCopy={save.saveAsCopy} onClose={save.closeConflict} />
          </Suspense>
        )}
      </FieldFeedbackContext.Provider>
    </CalibratedTuningContext.Provider>
  );
}

/** The designer: inputs by part, live results, drawing, charts, and saving. */
export default withApi(DesignerInner);
