import { useCallback, useState } from 'react';

import { cleanError } from '@/lib/clean-error';

/**
 * The pending and failure state of an auth form's submit. `run` awaits the action; a string it
 * returns is shown as the failure, and a thrown error becomes a sentence via `cleanError`.
 */
export function useAuthAction() {
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const run = useCallback(async (action: () => Promise<string | null | undefined | void>) => {
    setPending(true);
    setFailure(null);
    try {
      const message = await action();
      if (message) setFailure(message);
    } catch (e) {
      setFailure(cleanError(e));
    } finally {
      setPending(false);
    }
  }, []);
  return { pending, failure, run };
}
