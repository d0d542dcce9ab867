import { DeleteZone } from '@/components/ui/delete-zone';

type DeleteSiteZoneProps = { siteName: string; pending: boolean; error: unknown; onDelete: () => void };

/** Deleting a site asks once more, inline. */
export function DeleteSiteZone({ siteName, pending, error, onDelete }: DeleteSiteZoneProps) {
  return <DeleteZone noun="site" itemName={siteName} consequence="Removes the site, its horizon and its settings." pending={pending} error={error} onDelete={onDelete} testIDPrefix="site" />;
}
