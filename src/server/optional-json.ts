import { ApiError, readJson } from './http';

/** A JSON body that may be left out entirely (an empty body reads as undefined); anything sent must be JSON. */
export async function readOptionalJson(request: Request, limit?: number): Promise<unknown> {
  const text = await request.clone().text();
  if (text.trim() === '') return undefined;
  try {
    return await readJson(request, limit);
  } catch (e) {
    if (e instanceof ApiError) throw e;
    throw new ApiError('invalid_json');
  }
}
