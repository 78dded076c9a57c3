import { useCallback, useState } from 'react';
import type { UseFormReset } from 'react-hook-form';
import { ApiFailure } from '~/lib/api/client';
import { useCreateDesign, useDesign, useFetchLatestDesign, useUpdateDesign, type DesignRecord } from '~/lib/api/queries/designs';
import type { ApiIssue } from '~/lib/api-errors';
import { copyName } from '~/lib/design/name';
import type { UnitSystem } from '~/lib/format';
import { fromDesignInput, toDesignInput, type FormValues } from './form/values';

export type SavedRecord = Omit<DesignRecord, 'result' | 'updatedAt'>;

type Options = {
  record: SavedRecord | null;
  signedIn: boolean;
  readOnly: boolean;
  system: UnitSystem;
  reset: UseFormReset<FormValues>;
  /** the values now stored as the newest revision */
  onSaved: (values: FormValues) => void;
  /** lifts the leave-page guard before the page navigates by itself */
  allowLeave: () => void;
  /** keeps my version in this browser when I take the newer revision after a conflict */
  keepAside: (mine: FormValues) => void;
  /** forgets the draft of a new design once it is stored */
  clearNewDraft: () => void;
};

/**
 * Saving a design: create on /designs/new, save a new revision otherwise. A save that meets a newer
 * revision on the server (409) changes nothing stored and opens the conflict choice: take the latest
 * (my version is kept aside) or save mine as a copy.
 */
export function useDesignSave({ record, signedIn, readOnly, system, reset, onSaved, allowLeave, keepAside, clearNewDraft }: Options) {
  const designId = record?.id ?? null;
  const [serverIssues, setServerIssues] = useState<ApiIssue[]>([]);
  const [formError, setFormError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const [conflict, setConflict] = useState<FormValues | null>(null);

  const { data: cached } = useDesign(designId, record ? ({ ...record, result: null } as DesignRecord) : undefined);
  const create = useCreateDesign();
  const update = useUpdateDesign(designId ?? 'new');
  const fetchLatest = useFetchLatestDesign(designId);

  const showApiError = useCallback((e: unknown) => {
    if (e instanceof ApiFailure) {
      const issues = e.issues.map((i) => ({ path: i.path.replace(/^design\./, ''), message: i.message }));
      setServerIssues(issues);
      setFormError(issues.length ? `${e.message} See the marked fields.` : e.message);
    } else setFormError(e instanceof Error ? e.message : 'Saving failed; nothing was changed.');
  }, []);

  const openCreated = (rec: DesignRecord, note: string) => {
    allowLeave();
    setStatus(note);
    window.location.assign(`/designs/${rec.id}`);
  };

  const onValid = (v: FormValues) => {
    setFormError(null);
    setStatus(null);
    if (readOnly) return;
    if (!record) {
      if (!signedIn) return;
      create.mutate(
        { name: v.name.trim(), design: toDesignInput(v) },
        {
          onSuccess: (rec) => {
            clearNewDraft();
            openCreated(rec, 'Saved. Opening the design…');
          },
          onError: showApiError,
        },
      );
      return;
    }
    update.mutate(
      { name: v.name.trim(), design: toDesignInput(v), revision: cached?.revision ?? record.revision },
      {
        onSuccess: (rec) => {
          onSaved(v);
          setStatus(`Saved as revision ${rec.revision}.`);
        },
        onError: (e) => {
          if (e instanceof ApiFailure && e.conflict) {
            setConflict(v);
            setFormError(null);
            return;
          }
          showApiError(e);
        },
      },
    );
  };
  const onInvalid = () => setFormError('Some fields need attention; they are marked below.');

  async function reloadLatest() {
    const mine = conflict;
    if (!record || !mine) return;
    try {
      const latest = await fetchLatest();
      keepAside(mine);
      const theirs = fromDesignInput(latest.design, latest.name, system);
      reset(theirs);
      onSaved(theirs);
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
      const rec = await create.mutateAsync({ name: copyName(mine.name.trim()), design: toDesignInput(mine) });
      setConflict(null);
      openCreated(rec, 'Saved as a copy. Opening it…');
    } catch (e) {
      setConflict(null);
      showApiError(e);
    }
  }

  // keeps the same empty list, so typing with no server issues shown renders nothing again
  const clearServerIssues = useCallback(() => setServerIssues((s) => (s.length === 0 ? s : [])), []);

  return {
    saving: create.isPending || update.isPending,
    revision: cached?.revision ?? null,
    serverIssues,
    clearServerIssues,
    formError,
    status,
    setStatus,
    conflict: conflict !== null,
    closeConflict: () => setConflict(null),
    onValid,
    onInvalid,
    reloadLatest,
    saveAsCopy,
  };
}
