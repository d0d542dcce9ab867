/**
 * The file name of a plan download, from the recipe's name and the night:
 * "Andromeda · Ha & L", 2026-10-10 → "andromeda-ha-l-2026-10-10.yaml" (ASCII only).
 */
export function planFileName(recipeName: string, nightDate?: string): string {
  const slug =
    recipeName
      .normalize('NFKD')
      .replace(/[^\x20-\x7e]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'plan';
  return nightDate ? `${slug}-${nightDate}.yaml` : `${slug}.yaml`;
}
