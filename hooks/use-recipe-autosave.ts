import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';

import type { ComposerDoc } from '@/hooks/use-composer';
import { recipeConflictOf, recipeKeys, saveRecipe } from '@/hooks/use-recipes';
import { isApiError, type FieldErrors } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

/** Quiet time after the last edit before a save goes out. */
export const AUTOSAVE_DELAY_MS = 800;

export type SaveFailure =
  | { kind: 'conflict'; current: RecipeDetail }
  | { kind: 'invalid'; doc: ComposerDoc; fields: FieldErrors; message: string }
  | { kind: 'error'; doc: ComposerDoc; message: string };

export type SaveState = 'saved' | 'saving' | 'unsaved' | 'failed' | 'conflict';

export const docOf = (r: RecipeDetail): ComposerDoc => ({ name: r.name, notes: r.notes, rigId: r.rigId, siteId: r.siteId, tree: r.tree });

function failureOf(error: unknown, doc: ComposerDoc): SaveFailure {
  const current = recipeConflictOf(error);
  if (current) return { kind: 'conflict', current };
  if (isApiError(error, 400) && error.fields) return { kind: 'invalid', doc, fields: error.fields, message: cleanError(error) };
  return { kind: 'error', doc, message: cleanError(error) };
}

/**
 * Autosave for the composer: ~800 ms after the last edit the whole recipe goes out with the
 * version last seen. Local edits are never dropped: a failed save keeps them and retries on
 * the next edit (or Retry); a 409 stops saving until the user loads theirs or overwrites.
 */
export function useRecipeAutosave(id: string, doc: ComposerDoc, initialVersion: number) {
  const queryClient = useQueryClient();
  const version = useRef(initialVersion);
  const [savedDoc, setSavedDoc] = useState(doc);
  const [inFlight, setInFlight] = useState<ComposerDoc | null>(null);
  const [failure, setFailure] = useState<SaveFailure | null>(null);
  const latest = useRef({ doc, savedDoc, inFlight });
  latest.current = { doc, savedDoc, inFlight };

  const save = useCallback(
    (toSave: ComposerDoc, atVersion = version.current) => {
      setInFlight(toSave);
      return saveRecipe(id, { ...toSave, version: atVersion })
        .then((recipe) => {
          version.current = recipe.version;
          setSavedDoc(toSave);
          setFailure(null);
          void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
          void queryClient.invalidateQueries({ queryKey: recipeKeys.revisions(id) });
        })
        .catch((error: unknown) => setFailure(failureOf(error, toSave)))
        .finally(() => setInFlight(null));
    },
    [id, queryClient],
  );

  const dirty = doc !== savedDoc;
  const blocked = failure !== null && (failure.kind === 'conflict' || failure.doc === doc);
  useEffect(() => {
    if (!dirty || inFlight || blocked) return;
    const timer = setTimeout(() => void save(doc), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [doc, dirty, inFlight, blocked, save]);

  // Leaving the composer (another screen) sends what is left at once.
  useEffect(
    () => () => {
      const { doc: last, savedDoc: saved, inFlight: sending } = latest.current;
      if (last === saved || last === sending) return;
      saveRecipe(id, { ...last, version: version.current })
        .then(() => queryClient.invalidateQueries({ queryKey: recipeKeys.lists() }))
        .catch(() => undefined);
    },
    [id, queryClient],
  );

  const state: SaveState = failure?.kind === 'conflict' ? 'conflict' : inFlight ? 'saving' : failure && failure.doc === doc ? 'failed' : dirty ? 'unsaved' : 'saved';

  return {
    state,
    failure,
    version: version.current,
    /** Saves now (the Retry of a failed save). */
    retry: useCallback(() => void save(latest.current.doc), [save]),
    /** After a conflict: save mine over theirs, on top of their version. */
    overwrite: useCallback(
      (current: RecipeDetail) => {
        version.current = current.version;
        setFailure(null);
        void save(latest.current.doc, current.version);
      },
      [save],
    ),
    /** The server now holds `recipe` (their version loaded, a revision restored): in step with it. */
    adopt: useCallback((recipe: RecipeDetail, asDoc: ComposerDoc) => {
      version.current = recipe.version;
      setSavedDoc(asDoc);
      setFailure(null);
    }, []),
  };
}
