import { useSyncExternalStore } from 'react';
import { formatDate } from '~/lib/format';

const subscribe = () => () => {};

/**
 * A date in the reader's locale and time zone, rendered the same on the server and in the first client render
 * (the UTC date, "2026-12-02", or with the time "2026-12-02 06:45 UTC") and only then in the reader's own
 * format, so that hydration never meets two different texts.
 */
export function LocalDate({ iso, withTime = false }: { iso: string | null | undefined; withTime?: boolean }) {
  const hydrated = useSyncExternalStore(subscribe, () => true, () => false);
  if (!iso) return <>{formatDate(iso)}</>;
  const fixed = withTime ? `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC` : iso.slice(0, 10);
  return <time dateTime={iso}>{hydrated ? formatDate(iso, withTime) : fixed}</time>;
}
