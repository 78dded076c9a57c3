import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { referenceCases } from '~/lib/validation/cases';
import { methodNotes } from '~/lib/content/methods';

let s: TestServer;
let html = '';
beforeAll(async () => {
  s = await startServer();
  const r = await fetch(`${s.url}/methods`);
  expect(r.status).toBe(200);
  html = await r.text();
});
afterAll(async () => {
  await s?.stop();
});

/** Every id attribute on the rendered page, in document order (duplicates kept). */
const idsOn = (page: string) => [...page.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);

describe('GET /methods anchors', () => {
  it('GET /methods has an element with id equal to every reference case method, so each /validation link lands', () => {
    const ids = new Set(idsOn(html));
    const missing = [...new Set(referenceCases.map((c) => c.method))].filter((m) => !ids.has(m));
    expect(missing, `no id on /methods for: ${missing.join(', ')}`).toEqual([]);
  });

  it('GET /methods renders a section per method note and an anchor per alias, each id once on the page', () => {
    const ids = idsOn(html);
    const seen = new Map<string, number>();
    for (const id of ids) seen.set(id, (seen.get(id) ?? 0) + 1);
    expect([...seen].filter(([, n]) => n > 1), 'ids used twice').toEqual([]);
    for (const n of methodNotes) {
      expect(html, n.id).toMatch(new RegExp(`<section[^>]*\\sid="${n.id}"`));
      for (const a of n.aliases) expect(seen.get(a), `alias ${a} of ${n.id}`).toBe(1);
    }
  });

  it('GET /methods links within itself only to ids it has', () => {
    const ids = new Set(idsOn(html));
    const targets = [...html.matchAll(/href="#([^"]+)"/g)].map((m) => m[1]);
    expect(targets.length).toBeGreaterThanOrEqual(methodNotes.length);
    expect(targets.filter((t) => !ids.has(t))).toEqual([]);
  });
});

describe('methodNotes', () => {
  it('methodNotes each give a formula, accuracy, range, references with a provenance mark and what is not modelled', () => {
    for (const n of methodNotes) {
      expect(n.formulas.length, n.id).toBeGreaterThan(0);
      expect(n.accuracy.trim(), n.id).not.toBe('');
      expect(n.range.trim(), n.id).not.toBe('');
      expect(n.references.length, n.id).toBeGreaterThan(0);
      expect(n.notModelled.length, n.id).toBeGreaterThan(0);
      for (const r of n.references) expect(r.mark.trim(), `${n.id}: ${r.text}`).not.toBe('');
    }
  });
});
