import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { FormProvider, useForm, useWatch, type FieldErrors, type Resolver } from 'react-hook-form';
import { QueryClient, QueryClientProvider, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DesignInput } from '~/lib/design';
import { checkDesignName, copyName } from '~/lib/design/name';
import { formatQuantity, lengthInputText, type UnitSystem } from '~/lib/format';
import type { SolverWarning } from '~/solver';
import { createDesign } from '~/lib/api/create-design';
import { updateDesign } from '~/lib/api/update-design';
import { designQueryKey, getDesign } from '~/lib/api/get-design';
import { updateUnitSystem } from '~/lib/api/update-unit-system';
import { ApiRequestError } from '~/lib/api/request';
import type { DesignRecord, DesignRole } from '~/lib/api/types';
import { CoilDrawing } from '../drawing/CoilDrawing';
import { FieldFeedbackContext, fieldId, type FieldFeedback } from './form/field-context';
import { SecondaryPart, ToploadPart, PrimaryPart, TankPart, SupplyPart, TuningPart } from './form/parts';
import { convertLengths, emptyValues, fromDesignInput, toDesignInput, type FormValues } from './form/values';
import { ResultsPanel } from './results/ResultsPanel';
import { GoalPanel } from './GoalPanel';
import { ChartsPanel } from './ChartsPanel';
import { UnitSwitch } from './UnitSwitch';
import { ConflictDialog } from './ConflictDialog';
import { useLiveSolve } from './use-live-solve';
import { useLeaveGuard } from './use-leave-guard';
import { clearDraft, readDraft, writeDraft } from './draft';
import type { Goal, GoalAnswer } from '../../workers/protocol';

export type DesignerProps = {
  signedIn: boolean;
  unitSystem: UnitSystem;
  /** the saved design being edited; absent on /designs/new */
  record?: { id: string; name: string; design: DesignInput; revision: number; role: DesignRole } | null;
  /** where a new design starts: an example, or null for a draft or a blank design */
  start?: { name: string; design: DesignInput } | null;
  signInHref?: string;
};

// The schema and its unit parser load on the first check (the first save), not with the page: the
// live results already come from the same schema in the worker.
let schemaResolver: Promise<Resolver<FormValues>> | null = null;
function loadSchemaResolver(): Promise<Resolver<FormValues>> {
  schemaResolver ??= Promise.all([import('@hookform/resolvers/zod'), import('~/lib/design/schema')]).then(
    ([{ zodResolver }, { designInputSchema }]) => zodResolver(designInputSchema) as unknown as Resolver<FormValues>,
  );
  return schemaResolver;
}

// The schema the API uses checks the design; the form adds only the name.
const resolver: Resolver<FormValues> = async (values, context, options) => {
  const schema = await loadSchemaResolver();
  const r = await schema(toDesignInput(values) as unknown as FormValues, context, options);
  const errors: FieldErrors<FormValues> = { ...r.errors };
  const nameError = checkDesignName(values.name);
  if (nameError) errors.name = { type: 'validate', message: nameError };
  return Object.keys(errors).length ? { values: {}, errors } : { values, errors: {} };
};

function getPath(o: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((v, k) => (v && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined), o);
}

const keyOf = (v: FormValues) => JSON.stringify([v.name.trim(), toDesignInput(v)]);

function capacitanceText(c: number): string {
  return formatQuantity(c, 'capacitance', { digits: 4 }).replace('µ', 'u');
}

function DesignerInner({ signedIn, unitSystem, record, start, signInHref = '/sign-in?next=%2Fdesigns%2Fnew' }: DesignerProps) {
  const editing = Boolean(record);
  const readOnly = record?.role === 'viewer';
  const [system, setSystem] = useState<UnitSystem>(unitSystem);
  const initial = useMemo<FormValues>(() => {
    if (record) return fromDesignInput(record.design, record.name, unitSystem);
    if (start) return fromDesignInput(start.design, start.name, unitSystem);
    return emptyValues(unitSystem);
  }, []);
  const form = useForm<FormValues>({ defaultValues: initial, resolver, mode: 'onSubmit', reValidateMode: 'onChange' });
  const { control, getValues, reset, setValue, formState, handleSubmit } = form;
  const values = useWatch({ control }) as FormValues;
  const input = useMemo(() => toDesignInput(values), [values]);
  const inputKey = useMemo(() => JSON.stringify(input), [input]);
  const { live, last, pending } = useLiveSolve(input, inputKey);

  const [saved, setSaved] = useState<FormValues | null>(editing ? initial : null);
  const [startValues, setStartValues] = useState<FormValues>(initial);
  const currentKey = useMemo(() => keyOf(values), [values]);
  const dirty = currentKey !== keyOf(saved ?? startValues);
  const guard = useLeaveGuard(dirty && (editing || signedIn) && !readOnly);

  const [serverIssues, setServerIssues] = useState<Array<{ path: string; message: string }>>([]);
  const [formError, setFormError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const [unitNote, setUnitNote] = useState<string | null>(null);
  const [draftNote, setDraftNote] = useState<string | null>(null);
  const [conflict, setConflict] = useState<FormValues | null>(null);
  const [setAside, setSetAside] = useState<FormValues | null>(null);

  // A draft from an earlier visit, or a version set aside on a conflict, lives in this browser only.
  useEffect(() => {
    if (record) {
      const kept = readDraft(`unsaved:${record.id}`);
      if (kept) setSetAside(convertLengths(kept.values, unitSystem));
      return;
    }
    if (start) return;
    const d = readDraft('new');
    if (d) {
      const v = convertLengths(d.values, unitSystem);
      reset(v);
      setDraftNote(`Your draft from ${new Date(d.savedAt).toLocaleString()} is back.`);
    }
  }, []);

  // Keep the draft of a new design as it is typed.
  useEffect(() => {
    if (editing) return;
    const t = setTimeout(() => writeDraft('new', getValues()), 400);
    return () => clearTimeout(t);
  }, [currentKey]);

  useEffect(() => setServerIssues([]), [inputKey]);

  const liveIssues = useMemo(() => (live.status === 'invalid' ? live.issues : []), [live]);
  const warnings = useMemo<SolverWarning[]>(() => (live.status === 'ok' ? live.result.warnings : []), [live]);
  const feedback = useMemo<FieldFeedback>(
    () => ({
      errorFor: (path) =>
        serverIssues.find((i) => i.path === path)?.message ??
        liveIssues.find((i) => i.path === path)?.message ??
        (getPath(formState.errors, path) as { message?: string } | undefined)?.message,
      warningsFor: (path) => warnings.filter((w) => w.path === path),
      readOnly,
    }),
    [serverIssues, liveIssues, warnings, formState.errors, readOnly],
  );

  const qc = useQueryClient();
  const queryKey = designQueryKey(record?.id ?? 'new');
  const { data: cached } = useQuery<DesignRecord>({
    queryKey,
    queryFn: () => getDesign(record!.id),
    enabled: false,
    initialData: record ? ({ ...record, result: null } as DesignRecord) : undefined,
    staleTime: Infinity,
  });

  const showApiError = useCallback((e: unknown) => {
    if (e instanceof ApiRequestError) {
      const issues = e.issues.map((i) => ({ path: i.path.replace(/^design\./, ''), message: i.message }));
      setServerIssues(issues);
      setFormError(issues.length ? `${e.message} See the marked fields.` : e.message);
    } else setFormError(e instanceof Error ? e.message : 'Saving failed; nothing was changed.');
  }, []);

  const create = useMutation({
    mutationFn: (v: FormValues) => createDesign({ name: v.name.trim(), design: toDesignInput(v) }),
    onSuccess: (rec) => {
      clearDraft('new');
      guard.allow();
      setStatus('Saved. Opening the design…');
      window.location.assign(`/designs/${rec.id}`);
    },
    onError: showApiError,
  });

  const update = useMutation({
    mutationFn: (vars: { values: FormValues; revision: number }) =>
      updateDesign(record!.id, { name: vars.values.name.trim(), design: toDesignInput(vars.values), revision: vars.revision }),
    onMutate: async (vars) => {
      await qc.cancelQueries({ queryKey });
      const previous = qc.getQueryData<DesignRecord>(queryKey);
      if (previous) qc.setQueryData<DesignRecord>(queryKey, { ...previous, name: vars.values.name.trim(), design: toDesignInput(vars.values) });
      return { previous };
    },
    onError: (e, vars, ctx) => {
      if (ctx?.previous) qc.setQueryData(queryKey, ctx.previous);
      if (e instanceof ApiRequestError && e.status === 409) {
        setConflict(vars.values);
        setFormError(null);
        return;
      }
      showApiError(e);
    },
    onSuccess: (rec, vars) => {
      qc.setQueryData(queryKey, rec);
      setSaved(vars.values);
      setStatus(`Saved as revision ${rec.revision}.`);
    },
  });

  const saving = create.isPending || update.isPending;
  const onValid = (v: FormValues) => {
    setFormError(null);
    setStatus(null);
    if (readOnly) return;
    if (!editing) {
      if (!signedIn) return;
      create.mutate(v);
      return;
    }
    update.mutate({ values: v, revision: cached?.revision ?? record!.revision });
  };
  const onInvalid = () => setFormError('Some fields need attention; they are marked below.');
  const submit = handleSubmit(onValid, onInvalid);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === 's') {
        e.preventDefault();
        void submit();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [submit]);

  function switchUnits(next: UnitSystem) {
    if (next === system) return;
    reset(convertLengths(getValues(), next));
    setSaved((s) => (s ? convertLengths(s, next) : s));
    setStartValues((s) => convertLengths(s, next));
    setSetAside((s) => (s ? convertLengths(s, next) : s));
    setSystem(next);
    if (signedIn) {
      setUnitNote('Saving your preference…');
      updateUnitSystem(next).then(
        () => setUnitNote('Saved as your preference.'),
        () => setUnitNote('Shown here; your preference could not be stored.'),
      );
    } else setUnitNote(null);
  }

  function applyGoal(a: GoalAnswer, goal: Goal) {
    const opts = { shouldDirty: true, shouldValidate: formState.isSubmitted };
    if (a.kind === 'frequency') setValue('secondary.turns', String(Math.max(1, Math.round(a.turns))), opts);
    if (a.kind === 'tap') {
      setValue('tank.mode', 'single', opts);
      setValue('tank.capacitance', capacitanceText(a.capacitance), opts);
    }
    if (a.kind === 'coupling' && goal.kind === 'coupling') {
      setValue('secondary.elevation', lengthInputText(a.elevation, system, 4), opts);
      setValue('tuning.targetCoupling', String(goal.k), opts);
    }
  }

  async function reloadLatest() {
    const mine = conflict;
    if (!record || !mine) return;
    try {
      const latest = await qc.fetchQuery({ queryKey, queryFn: () => getDesign(record.id), staleTime: 0 });
      writeDraft(`unsaved:${record.id}`, mine);
      const theirs = fromDesignInput(latest.design, latest.name, system);
      reset(theirs);
      setSaved(theirs);
      setSetAside(mine);
      setConflict(null);
      setStatus(`Showing revision ${latest.revision}. Your version is kept in this browser: bring it back below when you want it.`);
    } catch (e) {
      showApiError(e);
    }
  }

  async function saveAsCopy() {
    const mine = conflict;
    if (!mine) return;
    try {
      const rec = await createDesign({ name: copyName(mine.name.trim()), design: toDesignInput(mine) });
      guard.allow();
      setConflict(null);
      setStatus('Saved as a copy. Opening it…');
      window.location.assign(`/designs/${rec.id}`);
    } catch (e) {
      setConflict(null);
      showApiError(e);
    }
  }

  function bringBack() {
    if (!setAside || !record) return;
    reset(setAside);
    setSetAside(null);
    clearDraft(`unsaved:${record.id}`);
    setStatus('Your version is back; save to keep it as the newest revision.');
  }

  function startOver() {
    clearDraft('new');
    const v = emptyValues(system);
    reset(v);
    setStartValues(v);
    setDraftNote(null);
  }

  const shown = live.status === 'ok' ? { design: live.design, result: live.result } : last;
  const nameError = feedback.errorFor('name');
  const issues = live.status === 'invalid' ? live.issues : [];

  return (
    <FormProvider {...form}>
      <FieldFeedbackContext.Provider value={feedback}>
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
                  <UnitSwitch value={system} onChange={switchUnits} note={unitNote} />
                  <SaveBar
                    signedIn={signedIn}
                    editing={editing}
                    readOnly={readOnly}
                    saving={saving}
                    dirty={dirty}
                    revision={cached?.revision ?? null}
                    signInHref={signInHref}
                  />
                  <div role="alert" className={formError ? 'cw-alert' : undefined}>
                    {formError}
                  </div>
                  <div role="status" className={status ? 'cw-success' : 'sr-only'}>
                    {status}
                  </div>
                  {draftNote && (
                    <p className="text-sm text-ink-soft">
                      {draftNote}{' '}
                      <button type="button" className="font-medium text-arc underline" onClick={startOver}>
                        Start over
                      </button>
                    </p>
                  )}
                  {setAside && (
                    <div className="rounded-lg border border-arc p-3 text-sm" data-testid="set-aside">
                      <p>A version of yours that was not saved is kept in this browser.</p>
                      <div className="mt-2 flex flex-wrap gap-2">
                        <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" onClick={bringBack}>
                          Bring back my version
                        </button>
                        <button
                          type="button"
                          className="cw-btn cw-btn-quiet cw-btn-small"
                          onClick={() => {
                            if (record) clearDraft(`unsaved:${record.id}`);
                            setSetAside(null);
                          }}
                        >
                          Discard it
                        </button>
                      </div>
                    </div>
                  )}
                </div>
                <SecondaryPart system={system} />
                <ToploadPart system={system} />
                <PrimaryPart system={system} />
                <TankPart />
                <SupplyPart />
                <TuningPart system={system} />
              </form>
              <GoalPanel input={input} system={system} hasPrimary={values.primary.enabled} hasTank={values.tank.mode !== 'none'} readOnly={readOnly} apply={applyGoal} />
            </div>

            <aside aria-labelledby="results-title" className="space-y-4">
              <div className="flex items-baseline justify-between gap-3">
                <h2 id="results-title" className="text-xl font-semibold">
                  Results
                </h2>
                <span className="text-xs text-ink-soft" aria-live="polite" data-testid="solve-state" data-solve-ms={live.status === 'ok' ? live.ms.toFixed(2) : undefined}>
                  {live.status === 'invalid' ? 'waiting for valid input' : pending ? 'updating…' : live.status === 'ok' ? 'up to date' : ''}
                </span>
              </div>
              {issues.length > 0 && (
                <div className="cw-alert text-sm" role="status">
                  <p className="font-semibold">Results wait for {issues.length === 1 ? 'one field' : `${issues.length} fields`}:</p>
                  <ul className="mt-1 list-disc pl-5">
                    {issues.slice(0, 6).map((i) => (
                      <li key={`${i.path}-${i.message}`}>
                        <a href={`#${fieldId(i.path)}`}>{i.path}</a>: {i.message}
                      </li>
                    ))}
                  </ul>
                </div>
              )}
              {shown ? (
                <>
                  <section className="cw-card" aria-labelledby="drawing-title">
                    <h3 id="drawing-title" className="mb-2 text-base font-semibold">
                      Side section
                    </h3>
                    <CoilDrawing design={shown.design} result={shown.result} system={system} />
                  </section>
                  <ResultsPanel result={shown.result} system={system} stale={live.status !== 'ok'} />
                </>
              ) : (
                <p className="text-sm text-ink-soft">Computing…</p>
              )}
            </aside>
          </div>
          {shown && <ChartsPanel design={shown.design} input={input} inputKey={inputKey} system={system} />}
        </div>
        {conflict && <ConflictDialog onReload={reloadLatest} onCopy={saveAsCopy} onClose={() => setConflict(null)} />}
      </FieldFeedbackContext.Provider>
    </FormProvider>
  );
}

function SaveBar(props: { signedIn: boolean; editing: boolean; readOnly: boolean; saving: boolean; dirty: boolean; revision: number | null; signInHref: string }) {
  const { signedIn, editing, readOnly, saving, dirty, revision, signInHref } = props;
  if (readOnly) return <p className="text-sm text-ink-soft">You can view this design; ask its owner for edit access to change it.</p>;
  if (!signedIn) {
    return (
      <p className="text-sm">
        Your draft is kept in this browser. <a href={signInHref} className="font-semibold">Sign in to save it</a> to your account and share it.
      </p>
    );
  }
  return (
    <div className="flex flex-wrap items-center gap-3">
      <button type="submit" className="cw-btn cw-btn-primary" disabled={saving} aria-busy={saving}>
        {saving ? 'Saving…' : editing ? 'Save' : 'Save design'}
      </button>
      <span className="text-sm text-ink-soft" data-testid="save-state">
        {dirty ? 'Unsaved changes' : editing ? `All changes saved${revision ? ` (revision ${revision})` : ''}` : 'Not saved yet'}
        <span className="sr-only">. Ctrl+S or Cmd+S also saves.</span>
      </span>
    </div>
  );
}

const queryClient = new QueryClient({ defaultOptions: { queries: { retry: 1, refetchOnWindowFocus: false } } });

/** The designer: inputs by part, live results, drawing, charts, and saving. */
export default function Designer(props: DesignerProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <DesignerInner {...props} />
    </QueryClientProvider>
  );
}
