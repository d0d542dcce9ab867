import { router } from 'expo-router';
import { useState } from 'react';

import { RigForm } from '@/components/rigs/rig-form';
import { BackToSetup } from '@/components/setup/back-to-setup';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { useRigForm } from '@/hooks/use-rig-form';
import { useCreateRigMutation } from '@/hooks/use-rigs';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { defaultRigInput, type RigInput } from '@/shared/rig/schema';

/** A new rig starts from the trade's usual values (shared/rig/defaults.ts) for the user to replace. */
export function NewRigScreen() {
  const [initial] = useState(defaultRigInput);
  const form = useRigForm(initial);
  const create = useCreateRigMutation();

  function submit(input: RigInput) {
    create.mutate(input, {
      onSuccess: () => router.replace('/setup'),
      onError: (e) => {
        if (isApiError(e, 400) && e.fields) form.setServerErrors(e.fields);
      },
    });
  }

  const showBanner = create.isError && !(isApiError(create.error, 400) && create.error.fields);
  return (
    <Screen title="Add a rig" subtitle="Optics, camera, filters, focuser, rotator, mount and guider. Start from the usual values and put in your own." above={<BackToSetup />}>
      <RigForm
        form={form}
        submitLabel="Save rig"
        pending={create.isPending}
        onSubmit={submit}
        banner={showBanner ? <Banner tone="danger" title="Could not save the rig" message={cleanError(create.error)} /> : null}
      />
    </Screen>
  );
}
