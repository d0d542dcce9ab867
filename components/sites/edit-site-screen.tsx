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
import { useSiteForm } from '@/hooks/use-site-form';
import { csvRowsOf, useDeleteSiteMutation, useSiteQuery, useUpdateSiteMutation, useUploadHorizonMutation } from '@/hooks/use-sites';
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

/** The upload's failure to show by the horizon, unless a conflict banner or line errors carry it. */
function uploadFailure(error: unknown): unknown {
  if (!error || isApiError(error, 409) || csvRowsOf(error)) return null;
  return error;
}

function SiteEditor({ initialSite }: { initialSite: Site }) {
  // The version the user is editing; a save sends it, and the server answers 409 if it moved on.
  const [base, setBase] = useState(initialSite);
  const form = useSiteForm(initialSite);
  const update = useUpdateSiteMutation(initialSite.id);
  const upload = useUploadHorizonMutation(initialSite.id);
  const remove = useDeleteSiteMutation();
  const conflict = update.conflict ?? upload.conflict;

  function save(input: SiteInput, version: number) {
    upload.reset();
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

  function uploadHorizon(csv: string, fileName: string) {
    update.reset();
    upload.mutate(
      { csv, version: base.version },
      {
        // Stored: the site moved to a new version; other unsaved edits in the form stay.
        onSuccess: (site) => {
          setBase(site);
          form.horizon.reset(site.horizon);
        },
        onError: (e) => {
          const rows = csvRowsOf(e);
          if (rows) form.horizon.setCsvErrors(fileName, csv, rows);
        },
      },
    );
  }

  function loadTheirs(theirs: Site) {
    setBase(theirs);
    form.resetTo(theirs);
    update.reset();
    upload.reset();
  }

  function keepMine(theirs: Site) {
    const input = form.validate();
    if (input) save(input, theirs.version);
  }

  function onDelete() {
    remove.mutate(base.id, { onSuccess: () => router.replace('/setup') });
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
    <Screen title={base.name} subtitle="Edit the site's place, limits and horizon." width="form" above={<BackToSites />}>
      <SiteForm
        form={form}
        submitLabel="Save changes"
        pending={update.isPending && !conflict}
        onSubmit={(input) => save(input, base.version)}
        banner={banner}
        horizonUpload={{ onUpload: uploadHorizon, pending: upload.isPending, error: uploadFailure(upload.error) }}
      />
      <DeleteSiteZone siteName={base.name} pending={remove.isPending} error={remove.error} onDelete={onDelete} />
    </Screen>
  );
}
