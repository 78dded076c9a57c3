import { expect } from 'vitest';
import { Client } from './client';
import { exampleDesigns } from '../../src/lib/design/examples';

let seq = 0;
/** A unique address per call so tests never meet each other's accounts or mail. */
export function uniqueEmail(who: string): string {
  seq += 1;
  return `${who}-${process.pid}-${seq}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

/** A new signed-in account on the server at `base`: its client (holding the session), address and user id. */
export async function signUp(base: string, name: string, email = uniqueEmail(name.toLowerCase().replace(/\W+/g, '-'))) {
  const c = new Client(base);
  const { user } = await c.signUp(name, email);
  return { c, email, id: user.id };
}

export type CreatedDesign = { id: string; revision: number; result: unknown };

/** Creates a design through POST /api/v1/designs (an example coil by default) and asserts 201. */
export async function createDesign(c: Client, name: string, design: unknown = exampleDesigns[1].design): Promise<CreatedDesign> {
  const r = await c.post('/api/v1/designs', { name, design });
  expect(r.status, await r.clone().text()).toBe(201);
  return r.json();
}
