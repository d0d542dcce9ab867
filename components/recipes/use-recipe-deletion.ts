import { useCallback, useState } from 'react';

import { useDeleteRecipeMutation, useRestoreRecipeMutation } from '@/hooks/use-recipes';
import { cleanError } from '@/lib/clean-error';

type Deleted = { id: string; name: string };

/**
 * Deleting from the list: the recipe goes at once (a soft delete) and a snackbar offers Undo,
 * which restores it. No confirmation step: undo is the safety net.
 */
export function useRecipeDeletion() {
  const remove = useDeleteRecipeMutation();
  const restore = useRestoreRecipeMutation();
  const [deleted, setDeleted] = useState<Deleted | null>(null);
  const [error, setError] = useState<string | null>(null);

  const deleteRecipe = useCallback(
    (item: Deleted) => {
      setError(null);
      remove.mutate(item.id, { onSuccess: () => setDeleted(item), onError: (e) => setError(cleanError(e)) });
    },
    [remove],
  );
  const undoDelete = useCallback(() => {
    if (!deleted) return;
    restore.mutate(deleted.id, { onSuccess: () => setDeleted(null), onError: (e) => setError(cleanError(e)) });
  }, [deleted, restore]);
  const dismiss = useCallback(() => setDeleted(null), []);

  return { deleted, error, deleteRecipe, undoDelete, dismiss, deleting: remove.isPending ? remove.variables : null, restoring: restore.isPending };
}
