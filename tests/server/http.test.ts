import { describe, expect, it } from 'vitest';
import { ApiError, parseBody, parseParam, parseQuery } from '../../src/server/http';
import { compareQuerySchema, copyDesignBodySchema, revisionNumberParamSchema, updateMeBodySchema } from '../../src/lib/api/contracts';

const post = (body: string, headers: Record<string, string> = {}) =>
  new Request('http://127.0.0.1/api/v1/me', { method: 'PATCH', body, headers: { 'content-type': 'application/json', ...headers } });

async function refusal(p: Promise<unknown> | (() => unknown)): Promise<ApiError> {
  try {
    await (typeof p === 'function' ? p() : p);
  } catch (e) {
    if (e instanceof ApiError) return e;
    throw e;
  }
  throw new Error('expected a refusal');
}

describe('parseBody: the one place request bodies are read and checked', () => {
  it('answers the parsed body, with the schema’s trimming applied', async () => {
    expect(await parseBody(post('{"name":"  Ines  ","unitSystem":"imperial"}'), updateMeBodySchema)).toEqual({ name: 'Ines', unitSystem: 'imperial' });
  });

  it('names every refused field by its path', async () => {
    const e = await refusal(parseBody(post('{"name":"","unitSystem":"cubits"}'), updateMeBodySchema));
    expect(e.code).toBe('validation_failed');
    expect(e.issues).toEqual([
      { path: 'name', message: 'Your name cannot be empty.' },
      { path: 'unitSystem', message: 'Choose metric or imperial.' },
    ]);
  });

  it('refuses a body that is not JSON, and one larger than the limit before checking it', async () => {
    expect((await refusal(parseBody(post('{name:'), updateMeBodySchema))).code).toBe('invalid_json');
    expect((await refusal(parseBody(post(JSON.stringify({ name: 'x'.repeat(2000) })), updateMeBodySchema, { limit: 1000 }))).code).toBe('payload_too_large');
  });

  it('an optional body may be left out, but not sent broken', async () => {
    expect(await parseBody(post(''), copyDesignBodySchema, { optional: true })).toBeUndefined();
    expect(await parseBody(post('{"name":"Copy"}'), copyDesignBodySchema, { optional: true })).toEqual({ name: 'Copy' });
    expect((await refusal(parseBody(post('{'), copyDesignBodySchema, { optional: true }))).code).toBe('invalid_json');
    expect((await refusal(parseBody(post(''), updateMeBodySchema))).code).toBe('invalid_json');
  });
});

describe('parseQuery and parseParam', () => {
  it('reads a query through the contract; a missing or empty parameter is named', async () => {
    expect(parseQuery(new URL('http://x/c?from=2&to=5'), compareQuerySchema)).toEqual({ from: 2, to: 5 });
    const e = await refusal(() => parseQuery(new URL('http://x/c?from=2&to='), compareQuerySchema, 'Give two revision numbers to compare.'));
    expect(e.message).toBe('Give two revision numbers to compare.');
    expect(e.issues?.map((i) => i.path)).toEqual(['to']);
  });

  it('a path parameter that cannot name anything is a 404', async () => {
    expect(parseParam('3', revisionNumberParamSchema, 'No such revision.')).toBe(3);
    for (const bad of ['0', '1.5', 'abc', undefined]) {
      const e = await refusal(() => parseParam(bad, revisionNumberParamSchema, 'No such revision.'));
      expect([e.code, e.message]).toEqual(['not_found', 'No such revision.']);
    }
  });
});
