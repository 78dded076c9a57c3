import type { FormValues } from './form/values';

const PREFIX = 'coilwright:draft:';

export interface Draft {
  values: FormValues;
  savedAt: string;
}

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    // private modes may refuse storage altogether
    return null;
  }
}

/** Drafts live in this browser only: "new" for an unsaved design, "unsaved:<id>" for a version set aside on a conflict. */
export function readDraft(key: string): Draft | null {
  const raw = storage()?.getItem(PREFIX + key);
  if (!raw) return null;
  try {
    const d = JSON.parse(raw) as Draft;
    return d && typeof d === 'object' && d.values && typeof d.values === 'object' && d.values.secondary ? d : null;
  } catch {
    return null;
  }
}

export function writeDraft(key: string, values: FormValues) {
  try {
    storage()?.setItem(PREFIX + key, JSON.stringify({ values, savedAt: new Date().toISOString() } satisfies Draft));
  } catch {
    // a full or refused storage only costs the draft
  }
}

export function clearDraft(key: string) {
  storage()?.removeItem(PREFIX + key);
}
