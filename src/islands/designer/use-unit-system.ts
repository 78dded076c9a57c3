import { useCallback, useState } from 'react';
import { useUpdateMe } from '~/lib/api/queries/account';
import type { UnitSystem } from '~/lib/format';

/**
 * The units lengths are shown in on this page. A signed-in person's choice is also stored as their
 * preference; the note says whether that worked. The page keeps the new units either way.
 */
export function useUnitSystem(initial: UnitSystem, signedIn: boolean) {
  const [system, setSystem] = useState<UnitSystem>(initial);
  const [note, setNote] = useState<string | null>(null);
  const { mutate: store } = useUpdateMe();

  const choose = useCallback(
    (next: UnitSystem) => {
      setSystem(next);
      if (!signedIn) {
        setNote(null);
        return;
      }
      setNote('Saving your preference…');
      store(
        { unitSystem: next },
        {
          onSuccess: () => setNote('Saved as your preference.'),
          onError: () => setNote('Shown here; your preference could not be stored.'),
        },
      );
    },
    [signedIn, store],
  );

  return { system, note, choose };
}
