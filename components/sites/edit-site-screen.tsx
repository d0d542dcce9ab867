import { router } from 'expo-router';
import { useState } from 'react';

import { BackToSites } from '@/components/sites/back-link';
import { DeleteSiteZone } from '@/components/sites/delete-site-zone';
import { SiteForm } from '@/components/sites/site-form';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { siteFormValues, useSiteForm } from '@/hooks/use-site-form';
import { useDeleteSiteMutation, useSiteQuery, useUpdateSiteMutation } from '@/hooks/use-sites';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import type { Site, SiteInput } from '@/shared/schemas/site';

/** Loads the site, then hands a fixed copy to the editor so background refetches never wipe edits. */
export function EditSiteScreen({ id }: { id: string }) {
  const site = useSiteQuery(id);
  if (site.isPending) {
    return (
      <Screen width="form" above={<BackToSites />}>
        <LoadingView label="Loading site…" />
      </Screen>
    );
  }
  if (site.isError) {
    return (
      <Screen width="form" above={<BackToSites />}>
        <ErrorView error={site.error} onRetry={isApiError(site.error, 404) ? undefined : () => site.refetch()} retrying={site.isFetching} title="Could not load the site" />
      </Screen>
    );
  }
  return <SiteEditor initialSite={site.data} />;
}

function SiteEditor({ initialSite }: { initialSite: Site }) {
  // The version the user is editing; a save sends it, and the server answers 409 if it moved on.
  const [base, setBase] = useState(initialSite);
  const form = useSiteForm(initialSite);
  const update = useUpdateSiteMutation(initialSite.id);
  const remove = useDeleteSiteMutation();
  const conflict = update.conflict;

  function save(input: SiteInput, version: number) {
    update.mutate(
      { ...input, version },
      {
        onSuccess: () => router.replace('/sites'),
        onError: (e) => {
          if (isApiError(e, 400) && e.fields) form.setServerErrors(e.fields);
        },
      },
    );
  }

  function loadTheirs(theirs: Site) {
    setBase(theirs);
    form.reset(siteFormValues(theirs));
    update.reset();
  }

  function keepMine(theirs: Site) {
    const input = form.validate();
    if (input) save(input, theirs.version);
  }

  function onDelete() {
    remove.mutate(base.id, { onSuccess: () => router.replace('/sites') });
  }

  let banner = null;
  if (conflict) {
    banner = (
      <Banner tone="danger" title="This site was changed elsewhere" message="Someone saved a newer version while you were editing. Load it, or keep your changes and save over it." testID="site-conflict">
        <Button label="Load their version" variant="secondary" size="small" onPress={() => loadTheirs(conflict)} testID="site-conflict-load" />
        <Button label="Keep mine and save" size="small" onPress={() => keepMine(conflict)} pending={update.isPending} testID="site-conflict-overwrite" />
      </Banner>
    );
  } else if (update.isError && !(isApiError(update.error, 400) && update.error.fields)) {
    banner = <Banner tone="danger" title="Could not save the site" message={cleanError(update.error)} />;
  }

  return (
    <Screen title={base.name} subtitle="Edit the site's place and zone." width="form" above={<BackToSites />}>
      <SiteForm form={form} submitLabel="Save changes" pending={update.isPending && !conflict} onSubmit={(input) => save(input, base.version)} banner={banner} />
      <DeleteSiteZone siteName={base.name} pending={remove.isPending} error={remove.error} onDelete={onDelete} />
    </Screen>
  );
}
