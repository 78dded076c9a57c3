import { useEffect, useState } from 'react';

/** False in the server-rendered HTML and until React takes over the island in the browser. */
export function useHydrated(): boolean {
  const [hydrated, setHydrated] = useState(false);
  useEffect(() => setHydrated(true), []);
  return hydrated;
}
