import { router } from 'expo-router';
import { useState } from 'react';

import { RigForm } from '@/components/rigs/rig-form';
import { BackToSetup } from '@/components/setup/back-to-setup';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { DeleteZone } from '@/components/ui/delete-zone';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { useRigForm } from '@/hooks/use-rig-form';
import { useDeleteRigMutation, useRigQuery, useUpdateRigMutation } from '@/hooks/use-rigs';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import type { Rig, RigInput } from '@/shared/rig/schema';

/** Loads the rig, then hands a fixed copy to the editor so background refetches never wipe edits. */
export function EditRigScreen({ id }: { id: string }) {
  const rig = useRigQuery(id);
  if (rig.isPending) {
    return (
      <Screen above={<BackToSetup />}>
        <LoadingView label="Loading rig…" />
      </Screen>
    );
  }
  if (rig.isError) {
    return (
      <Screen above={<BackToSetup />}>
        <ErrorView error={rig.error} onRetry={isApiError(rig.error, 404) ? undefined : () => rig.refetch()} retrying={rig.isFetching} title="Could not load the rig" />
      </Screen>
    );
  }
  return <RigEditor initialRig={rig.data} />;
}

function RigEditor({ initialRig }: { initialRig: Rig }) {
  // The version the user is editing; a save sends it, and the server answers 409 if it moved on.
  const [base, setBase] = useState(initialRig);
  const form = useRigForm(initialRig);
  const update = useUpdateRigMutation(initialRig.id);
  const remove = useDeleteRigMutation();
  const conflict = update.conflict;

  function save(input: RigInput, version: number) {
    update.mutate(
      { ...input, version },
      {
        onSuccess: () => router.replace('/setup'),
        onError: (e) => {
          if (isApiError(e, 400) && e.fields) form.setServerErrors(e.fields);
        },
      },
    );
  }

  function loadTheirs(theirs: Rig) {
    setBase(theirs);
    form.reset(theirs);
    update.reset();
  }

  function keepMine(theirs: Rig) {
    const input = form.validate();
    if (input) save(input, theirs.version);
  }

  let banner = null;
  if (conflict) {
    banner = (
      <Banner tone="danger" title="This rig was changed elsewhere" message="Someone saved a newer version while you were editing. Load it, or keep your changes and save over it." testID="rig-conflict">
        <Button label="Load their version" variant="secondary" size="small" onPress={() => loadTheirs(conflict)} testID="rig-conflict-load" />
        <Button label="Keep mine and save" size="small" onPress={() => keepMine(conflict)} pending={update.isPending} testID="rig-conflict-overwrite" />
      </Banner>
    );
  } else if (update.isError && !(isApiError(update.error, 400) && update.error.fields)) {
    banner = <Banner tone="danger" title="Could not save the rig" message={cleanError(update.error)} />;
  }

  return (
    <Screen title={base.name} subtitle="Edit the rig. Derived values update as you type." above={<BackToSetup />}>
      <RigForm form={form} submitLabel="Save changes" pending={update.isPending && !conflict} onSubmit={(input) => save(input, base.version)} banner={banner} />
      <DeleteZone
        noun="rig"
        itemName={base.name}
        consequence="Removes the rig and its settings."
        pending={remove.isPending}
        error={remove.error}
        onDelete={() => remove.mutate(base.id, { onSuccess: () => router.replace('/setup') })}
        testIDPrefix="rig"
      />
    </Screen>
  );
}
