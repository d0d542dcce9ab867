/** Display words for club roles; better-auth may store several as a comma list. */
const ROLE_LABELS: Record<string, string> = { owner: 'Owner', admin: 'Admin', member: 'Member' };

export function rolesText(roles: readonly string[]): string {
  const flat = roles.flatMap((r) => r.split(',')).map((r) => r.trim()).filter(Boolean);
  return flat.map((r) => ROLE_LABELS[r] ?? r).join(', ') || 'Member';
}

export const ROLE_CHOICES = [
  { value: 'member', label: 'Member' },
  { value: 'admin', label: 'Admin' },
  { value: 'owner', label: 'Owner' },
] as const;
