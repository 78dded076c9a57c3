import { useCallback, useEffect, useRef, useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { UnitSystem } from '~/lib/format';
import { clearDraft, readDraft, writeDraft } from './draft';
import { convertLengths, type FormValues } from './form/values';

type Options = {
  /** the saved design's id; null on /designs/new */
  designId: string | null;
  /** a new design that starts from an example keeps no draft of its own to restore */
  fromExample: boolean;
  unitSystem: UnitSystem;
  form: UseFormReturn<FormValues>;
  /** changes whenever the name or the design changes */
  currentKey: string;
};

const NEW = 'new';
const unsavedKey = (id: string) => `unsaved:${id}`;

/**
 * Drafts kept in this browser only: the draft of a new design as it is typed (restored on the next
 * visit), and the version set aside when a save met a newer revision.
 */
export function useDraft({ designId, fromExample, unitSystem, form, currentKey }: Options) {
  const { getValues, reset } = form;
  const [note, setNote] = useState<string | null>(null);
  const [setAside, setSetAside] = useState<FormValues | null>(null);
  const restored = useRef(false);

  // A draft from an earlier visit, or a version set aside on a conflict, comes back once, on the first render.
  useEffect(() => {
    if (restored.current) return;
    restored.current = true;
    if (designId) {
      const kept = readDraft(unsavedKey(designId));
      if (kept) setSetAside(convertLengths(kept.values, unitSystem));
      return;
    }
    if (fromExample) return;
    const d = readDraft(NEW);
    if (d) {
      reset(convertLengths(d.values, unitSystem));
      setNote(`Your draft from ${new Date(d.savedAt).toLocaleString()} is back.`);
    }
  }, [designId, fromExample, unitSystem, reset]);

  // Keep the draft of a new design as it is typed.
  useEffect(() => {
    if (designId) return;
    const t = setTimeout(() => writeDraft(NEW, getValues()), 400);
    return () => clearTimeout(t);
  }, [designId, currentKey, getValues]);

  /** Sets my version aside in this browser (after a conflict), to be brought back later. */
  const keepAside = useCallback(
    (mine: FormValues) => {
      if (designId) writeDraft(unsavedKey(designId), mine);
      setSetAside(mine);
    },
    [designId],
  );

  /** Puts the set-aside version back into the form; returns false when there is none. */
  const bringBack = useCallback(() => {
    if (!setAside || !designId) return false;
    reset(setAside);
    setSetAside(null);
    clearDraft(unsavedKey(designId));
    return true;
  }, [designId, reset, setAside]);

  const discardAside = useCallback(() => {
    if (designId) clearDraft(unsavedKey(designId));
    setSetAside(null);
  }, [designId]);

  /** The new design was created: its draft is no longer needed. */
  const clearNew = useCallback(() => clearDraft(NEW), []);

  /** Forgets the restored draft of a new design. */
  const startOver = useCallback(() => {
    clearDraft(NEW);
    setNote(null);
  }, []);

  const convert = useCallback((next: UnitSystem) => setSetAside((s) => (s ? convertLengths(s, next) : s)), []);

  return { note, setAside, keepAside, bringBack, discardAside, clearNew, startOver, convert };
}
