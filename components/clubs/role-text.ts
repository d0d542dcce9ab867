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

/** "a member", "an admin", "an admin and member": a stored role (or comma list) after "as". */
export function roleWithArticle(role: string): string {
  const words = rolesText([role]).toLowerCase().split(', ');
  return `${/^[aeiou]/.test(words[0] ?? '') ? 'an' : 'a'} ${words.join(' and ')}`;
}
