/** A tiny cookie-keeping HTTP client for API tests against a running server. */
export class Client {
  cookies = new Map<string, string>();
  constructor(readonly base: string) {}

  async req(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    // A browser always sends its origin with a cookie-bearing POST; better-auth refuses one without it.
    const h: Record<string, string> = { origin: this.base, ...headers };
    if (this.cookies.size) h.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    let payload: BodyInit | undefined;
    if (body instanceof FormData) payload = body;
    else if (typeof body === 'string') {
      payload = body;
      h['content-type'] ??= 'application/json';
    } else if (body !== undefined) {
      payload = JSON.stringify(body);
      h['content-type'] = 'application/json';
    }
    const r = await fetch(this.base + path, { method, headers: h, body: payload, redirect: 'manual' });
    for (const c of r.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair.indexOf('=');
      const k = pair.slice(0, i);
      const v = pair.slice(i + 1);
      if (v === '' || /max-age=0/i.test(c)) this.cookies.delete(k);
      else this.cookies.set(k, v);
    }
    return r;
  }
  get(p: string) { return this.req('GET', p); }
  post(p: string, b?: unknown) { return this.req('POST', p, b); }
  put(p: string, b?: unknown) { return this.req('PUT', p, b); }
  patch(p: string, b?: unknown) { return this.req('PATCH', p, b); }
  del(p: string) { return this.req('DELETE', p); }

  async signUp(name: string, email: string, password = 'correct-horse-9') {
    const r = await this.post('/api/auth/sign-up/email', { name, email, password });
    if (r.status !== 200) throw new Error(`sign-up ${email}: ${r.status} ${await r.text()}`);
    return (await r.json()) as { user: { id: string } };
  }
  async signIn(email: string, password = 'correct-horse-9') {
    const r = await this.post('/api/auth/sign-in/email', { email, password });
    if (r.status !== 200) throw new Error(`sign-in ${email}: ${r.status} ${await r.text()}`);
    return r;
  }
}

export type CaughtMail = { to: string; subject: string; text: string; html: string; date: string };

export async function waitForMail(base: string, to: string, subjectPart: string, timeoutMs = 10_000): Promise<CaughtMail> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const list = (await (await fetch(`${base}/dev/mail.json`)).json()) as CaughtMail[];
    const m = list.find((x) => x.to.includes(to) && x.subject.includes(subjectPart));
    if (m) return m;
    if (Date.now() > end) throw new Error(`no mail to ${to} with "${subjectPart}" within ${timeoutMs} ms; saw ${list.length}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

export function linkIn(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error(`no link in: ${text}`);
  return m[0];
}
