import { useRef, useState } from 'react';

import { useIntakeMutation, useUndoIntakeMutation } from '@/hooks/use-calibration';
import { prepareIntake, splitFitsFiles, type IntakeSource, type LocalReject } from '@/lib/fits-intake';
import { INTAKE_MAX_FILES } from '@/shared/schemas/calibration-api';

export type IntakePhase = 'idle' | 'reading' | 'uploading' | 'done' | 'failed';

/** How the files were picked: a folder also holds other files, which are skipped and counted. */
export type PickKind = 'files' | 'folder';

/**
 * The import's steps in one place: pick, read every header (a few files at a time, with a
 * count), send them in one request (with upload progress), show what was recorded; undo.
 */
export function useIntake() {
  const intake = useIntakeMutation();
  const undo = useUndoIntakeMutation();
  const [phase, setPhase] = useState<IntakePhase>('idle');
  const [read, setRead] = useState({ done: 0, total: 0 });
  const [skipped, setSkipped] = useState(0);
  const [localRejects, setLocalRejects] = useState<LocalReject[]>([]);
  const [pickError, setPickError] = useState<string | null>(null);
  // A newer pick makes an older one's late answers moot.
  const run = useRef(0);

  async function pick(files: IntakeSource[], kind: PickKind) {
    const id = ++run.current;
    intake.reset();
    undo.reset();
    setPickError(null);
    setLocalRejects([]);
    const { fits, skipped: others } = kind === 'folder' ? splitFitsFiles(files) : { fits: files, skipped: 0 };
    setSkipped(others);
    if (fits.length === 0) {
      setPhase('failed');
      return setPickError(kind === 'folder' ? 'The folder holds no .fits, .fit or .fts files.' : 'Pick at least one FITS file.');
    }
    if (fits.length > INTAKE_MAX_FILES) {
      setPhase('failed');
      return setPickError(`That is ${fits.length} files; one import takes at most ${INTAKE_MAX_FILES}. Pick a night's folder at a time.`);
    }
    setPhase('reading');
    setRead({ done: 0, total: fits.length });
    const prepared = await prepareIntake(fits, (done) => {
      if (run.current === id) setRead({ done, total: fits.length });
    });
    if (run.current !== id) return;
    setLocalRejects(prepared.localRejects);
    if (prepared.files.length === 0) {
      setPhase('failed');
      return setPickError('None of the picked files had anything to read.');
    }
    setPhase('uploading');
    intake.mutate(prepared.files, {
      onSuccess: () => run.current === id && setPhase('done'),
      onError: () => run.current === id && setPhase('failed'),
    });
  }

  function undoImport() {
    const intakeId = intake.data?.intakeId;
    if (intakeId) undo.mutate(intakeId);
  }

  function restart() {
    run.current++;
    intake.reset();
    undo.reset();
    setPhase('idle');
    setPickError(null);
    setLocalRejects([]);
    setSkipped(0);
  }

  return { phase, read, skipped, localRejects, pickError, result: intake.data ?? null, uploadError: intake.error, progress: intake.progress, undo, undoImport, pick, restart };
}

export type IntakeFlow = ReturnType<typeof useIntake>;
