import { ApiError } from './http';

/** Runs a service call for a page; "no such design" (or no role on it) becomes null so the page can answer 404. */
export async function orNotFound<T>(load: () => Promise<T>): Promise<T | null> {
  try {
    return await load();
  } catch (e) {
    if (e instanceof ApiError && (e.code === 'not_found' || e.code === 'validation_failed')) return null;
    throw e;
  }
}
