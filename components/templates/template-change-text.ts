import type { TreeChange } from '@/shared/recipe/template-diff';

const steps = (count: number) => (count === 1 ? '1 step' : `${count} steps`);

/** A change in two parts: what happened where ("Changed in stage 'Core' (step 5)") and the step itself. */
export interface ChangeWords {
  lead: string;
  detail: string;
}

/**
 * One change of a newer template version in words, e.g. "Changed in stage 'Core' (step 5)" +
 * "Ha 3 × 300 s → Ha 40 × 300 s", "Added after 'Focus'" + "…", "Removed from stage 'M 31'" + "…".
 */
export function templateChangeWords(c: TreeChange): ChangeWords {
  const inside = c.where.within.join(' › ');
  const inner = c.innerSteps ? ` (with ${steps(c.innerSteps)} inside)` : '';
  switch (c.kind) {
    case 'changed': {
      const what = c.before === c.after ? (c.after ?? '') : `${c.before ?? ''} → ${c.after ?? ''}`;
      const settings = c.settings?.length ? ` (${c.settings.join(', ')})` : '';
      return { lead: `Changed ${inside ? `in ${inside} (step ${c.where.step})` : `at step ${c.where.step}`}`, detail: `${what}${settings}` };
    }
    case 'added': {
      const at = c.where.after ? `${inside ? `in ${inside} ` : ''}after '${c.where.after}'` : `at the start${inside ? ` of ${inside}` : ''}`;
      return { lead: `Added ${at}`, detail: `${c.after ?? ''}${inner}` };
    }
    case 'removed':
      return { lead: `Removed${inside ? ` from ${inside}` : ''}`, detail: `${c.before ?? ''}${inner}` };
  }
}

/** The change as one sentence: "Changed in stage 'Core' (step 5): Ha 3 × 300 s → Ha 40 × 300 s". */
export function templateChangeText(c: TreeChange): string {
  const { lead, detail } = templateChangeWords(c);
  return `${lead}: ${detail}`;
}
