// A fixed-window counter per client and bucket, in memory (one process).
const windows = new Map<string, { start: number; count: number }>();

export function allow(bucket: string, client: string, max: number, windowMs = 60_000, now = Date.now()): boolean {
  const key = `${bucket}:${client}`;
  const w = windows.get(key);
  if (!w || now - w.start >= windowMs) {
    if (windows.size > 10_000) windows.clear();
    windows.set(key, { start: now, count: 1 });
    return true;
  }
  w.count += 1;
  return w.count <= max;
}
