import { useState } from 'react';

import { angleText, framingFieldErrors, framingValues, useFramingForm } from '@/components/targets/framing-form';
import { useSaveFramingMutation, type FitsFramingResult } from '@/hooks/use-targets';
import { isApiError } from '@/lib/api';
import type { Rig } from '@/shared/rig/schema';
import type { Framing, FramingInput, Target } from '@/shared/schemas/target';
import { formatDec, formatRa } from '@/shared/targets/schema';

type Origin = Pick<FramingInput, 'source' | 'sourceDetail'>;

function fitsOrigin({ framing, frame }: FitsFramingResult, fileName: string): Origin {
  const text = (v: unknown) => (typeof v === 'string' ? v : null);
  return {
    source: 'fits',
    sourceDetail: {
      fileName,
      pixelScaleArcsecPerPx: framing.pixelScaleArcsecPerPx,
      mirrored: framing.mirrored,
      object: text(frame.object),
      filter: text(frame.filter),
      exposureS: typeof frame.exposureS === 'number' ? frame.exposureS : null,
      dateObs: text(frame.dateObs) ?? text(frame.dateObsUtc),
    },
  };
}

type Options = { target: Target; framing: Framing | null; rigs: Rig[]; onSaved: (framing: Framing) => void };

/**
 * The framing editor's state: the form, where its values came from (typed or a FITS header),
 * the version being edited, and saving with field errors and version conflicts.
 */
export function useFramingEditor({ target, framing, rigs, onSaved }: Options) {
  const [base, setBase] = useState(framing);
  const form = useFramingForm(framingValues(framing, target, rigs[0]?.id ?? ''));
  const [origin, setOrigin] = useState<Origin>({ source: framing?.source ?? 'manual', sourceDetail: framing?.sourceDetail ?? {} });
  const save = useSaveFramingMutation(target.id);

  function send(version: number | undefined) {
    const v = form.validate();
    if (!v) return;
    const { ra, dec, ...rest } = v;
    const input: FramingInput = { ...rest, raDeg: ra, decDeg: dec, ...origin };
    save.mutate(
      { input, framingId: base?.id, version },
      {
        onSuccess: (saved) => {
          setBase(saved);
          onSaved(saved);
        },
        onError: (e) => {
          if (isApiError(e, 400) && e.fields) form.setServerErrors(framingFieldErrors(e.fields));
        },
      },
    );
  }

  function fromFits(result: FitsFramingResult, fileName: string) {
    form.setField('ra', formatRa(result.framing.raDeg));
    form.setField('dec', formatDec(result.framing.decDeg));
    form.setField('positionAngleDeg', angleText(result.framing.positionAngleDeg));
    if (!base && typeof result.frame.object === 'string' && result.frame.object.trim()) form.setField('name', result.frame.object.trim());
    setOrigin(fitsOrigin(result, fileName));
  }

  function loadTheirs(theirs: Framing) {
    setBase(theirs);
    form.reset(framingValues(theirs, target, ''));
    setOrigin({ source: theirs.source, sourceDetail: theirs.sourceDetail });
    save.reset();
  }

  return { base, form, save, send, fromFits, loadTheirs };
}
