import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { referenceCases } from '~/lib/validation/cases';
import { assertClose } from '../helpers/assertClose';

let s: TestServer;
let html = '';
let methodsHtml = '';
beforeAll(async () => {
  s = await startServer();
  const r = await fetch(`${s.url}/validation`);
  expect(r.status).toBe(200);
  html = await r.text();
  methodsHtml = await (await fetch(`${s.url}/methods`)).text();
});
afterAll(async () => {
  await s?.stop();
});

/** The formula a case exercises, from its id with the trailing parameter segments removed ("awg-30" → "awg"). */
function formulaKey(id: string): string {
  const parts = id.split('-');
  while (parts.length > 1 && /\d/.test(parts[parts.length - 1])) parts.pop();
  return parts.join('-');
}

function rowsOf(page: string): Array<{ id: string; status: string; body: string }> {
  const rows: Array<{ id: string; status: string; body: string }> = [];
  const re = /<tr\b[^>]*data-case-id="([^"]+)"[^>]*data-status="([^"]+)"[^>]*>([\s\S]*?)<\/tr>/g;
  for (let m = re.exec(page); m; m = re.exec(page)) rows.push({ id: m[1], status: m[2], body: m[3] });
  return rows;
}

const unescape = (t: string) => t.replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');

describe('GET /validation', () => {
  it('referenceCases: at least 25 checks over at least 8 quantities, 10 against published tables or closed forms, each sourced and within tolerance', () => {
    expect(referenceCases.length).toBeGreaterThanOrEqual(25);
    expect(new Set(referenceCases.map((c) => c.quantity)).size).toBeGreaterThanOrEqual(8);
    expect(new Set(referenceCases.map((c) => c.method)).size).toBeGreaterThanOrEqual(8);
    expect(referenceCases.filter((c) => c.kind === 'published-table' || c.kind === 'closed-form').length).toBeGreaterThanOrEqual(10);
    expect(new Set(referenceCases.map((c) => c.id)).size).toBe(referenceCases.length);
    for (const c of referenceCases) {
      expect(c.source.trim().length, c.id).toBeGreaterThan(10);
      assertClose(c.compute(), c.reference, c.tolerance, `${c.id} (${c.unit}) inputs ${JSON.stringify(c.inputs)}`);
    }
  });

  it('referenceCases: no more than 3 checks per formula or per quantity, so one table cannot pad the count', () => {
    const count = (key: (c: (typeof referenceCases)[number]) => string) => {
      const m = new Map<string, number>();
      for (const c of referenceCases) m.set(key(c), (m.get(key(c)) ?? 0) + 1);
      return [...m].filter(([, n]) => n > 3);
    };
    expect(count((c) => `${c.method}:${formulaKey(c.id)}`)).toEqual([]);
    expect(count((c) => c.quantity)).toEqual([]);
  });

  it('GET /validation renders one row per reference case, each with its pass mark, source and method link', () => {
    const rows = rowsOf(html);
    expect(rows.length).toBe(referenceCases.length);
    expect(rows.map((r) => r.id).sort()).toEqual(referenceCases.map((c) => c.id).sort());
    for (const c of referenceCases) {
      const row = rows.find((r) => r.id === c.id)!;
      expect(row.status, c.id).toBe('pass');
      expect(row.body, c.id).toContain('data-mark="pass"');
      expect(unescape(row.body), c.id).toContain(c.source);
      expect(row.body, c.id).toContain(`href="/methods#${c.method}"`);
      expect(methodsHtml, `/methods has an anchor for ${c.method}`).toMatch(new RegExp(`id="${c.method}"`));
    }
  });

  it('GET /validation shows the summary counts of the same cases and ships no script', () => {
    const published = referenceCases.filter((c) => c.kind === 'published-table' || c.kind === 'closed-form').length;
    const quantities = new Set(referenceCases.map((c) => c.quantity)).size;
    expect(html).toMatch(new RegExp(`data-count="checks"[^>]*>${referenceCases.length}<`));
    expect(html).toMatch(new RegExp(`data-count="quantities"[^>]*>${quantities}<`));
    expect(html).toMatch(new RegExp(`data-count="published"[^>]*>${published}<`));
    expect(html).toMatch(new RegExp(`data-count="passing"[^>]*>All ${referenceCases.length}<`));
    expect(html).not.toMatch(/<script\b/i);
    expect(html).not.toMatch(/NaN|Infinity/);
  });
});
