import { router } from 'expo-router';

import { BackToSites } from '@/components/sites/back-link';
import { SiteForm } from '@/components/sites/site-form';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { useSiteForm } from '@/hooks/use-site-form';
import { useCreateSiteMutation, useSitesQuery } from '@/hooks/use-sites';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import type { SiteInput } from '@/shared/schemas/site';

export function NewSiteScreen() {
  const form = useSiteForm(undefined);
  const create = useCreateSiteMutation();
  const sites = useSitesQuery();
  const isFirst = sites.data?.length === 0;

  function submit(input: SiteInput) {
    // The first site becomes the default: Tonight has to open with something.
    create.mutate(isFirst ? { ...input, isDefault: true } : input, {
      onSuccess: () => router.replace('/setup'),
      onError: (e) => {
        if (isApiError(e, 400) && e.fields) form.setServerErrors(e.fields);
      },
    });
  }

  const showBanner = create.isError && !(isApiError(create.error, 400) && create.error.fields);
  return (
    <Screen title="Add a site" subtitle="Where the rig stands. The night's times are worked out for this place." width="form" above={<BackToSites />}>
      <SiteForm
        form={form}
        submitLabel="Save site"
        pending={create.isPending}
        onSubmit={submit}
        banner={showBanner ? <Banner tone="danger" title="Could not save the site" message={cleanError(create.error)} /> : null}
      />
    </Screen>
  );
}
