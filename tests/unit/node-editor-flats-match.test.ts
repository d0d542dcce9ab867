import { describe, expect, it } from 'vitest';
import { applyDraft } from '@/components/recipes/node-editor/apply';
import { nodeToDraft } from '@/components/recipes/node-editor/draft';
import { createNode } from '@/shared/recipe/factory';

let n = 0;
const newId = () => `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`;
const flats = (params: Record<string, unknown> = {}) => createNode('flats', { filters: ['Ha'], ...params } as never, { newId });

describe('flats editor: what the flats return to', () => {
  it('reads recorded positions into their own fields and writes them back unchanged', () => {
    const node = flats({ matchFramingOf: { kind: 'positions', rotatorAngleDeg: 125.4, focuserPositionSteps: 15200 } });
    const draft = nodeToDraft(node);
    expect(draft.values['matchFramingOf.mode']).toBe('positions');
    expect(draft.values['matchFramingOf.rotatorAngleDeg']).toBe('125.4');
    expect(draft.values['matchFramingOf.focuserPositionSteps']).toBe('15200');
    const result = applyDraft(draft, node);
    expect(result.ok && result.node).toEqual(node);
  });

  it('edits one position and leaves the other out when blank', () => {
    const node = flats({ matchFramingOf: { kind: 'positions', rotatorAngleDeg: 125.4, focuserPositionSteps: 15200 } });
    const draft = nodeToDraft(node);
    draft.values['matchFramingOf.rotatorAngleDeg'] = '';
    draft.values['matchFramingOf.focuserPositionSteps'] = '15 310'.replace(' ', '');
    const result = applyDraft(draft, node);
    expect(result.ok && result.node.kind === 'flats' && result.node.matchFramingOf).toEqual({ kind: 'positions', focuserPositionSteps: 15310 });
  });

  it('asks for at least one position, and refuses a rotator angle of 360° or more', () => {
    const node = flats({ matchFramingOf: { kind: 'positions', rotatorAngleDeg: 10 } });
    const draft = nodeToDraft(node);
    draft.values['matchFramingOf.rotatorAngleDeg'] = '';
    const none = applyDraft(draft, node);
    expect(none.ok).toBe(false);
    expect(!none.ok && none.errors.matchFramingOf).toBe('Give a rotator angle, a focuser position or both');
    draft.values['matchFramingOf.rotatorAngleDeg'] = '360';
    const over = applyDraft(draft, node);
    expect(!over.ok && over.errors['matchFramingOf.rotatorAngleDeg']).toBe('Rotator angle must be below 360°');
  });

  it('adds positions to flats that matched nothing, and drops them again', () => {
    const node = flats();
    const draft = nodeToDraft(node);
    expect(draft.values['matchFramingOf.mode']).toBe('none');
    draft.values['matchFramingOf.mode'] = 'positions';
    draft.values['matchFramingOf.kind'] = 'positions';
    draft.values['matchFramingOf.rotatorAngleDeg'] = '305';
    const added = applyDraft(draft, node);
    expect(added.ok && added.node.kind === 'flats' && added.node.matchFramingOf).toEqual({ kind: 'positions', rotatorAngleDeg: 305 });
    draft.values['matchFramingOf.mode'] = 'none';
    const dropped = applyDraft(draft, node);
    expect(dropped.ok && dropped.node.kind === 'flats' && dropped.node.matchFramingOf).toBeUndefined();
  });

  it('keeps a stage or framing match as it is', () => {
    const stageId = newId();
    const node = flats({ matchFramingOf: { kind: 'stage', stageId } });
    const draft = nodeToDraft(node);
    expect(draft.values['matchFramingOf.mode']).toBe('framing');
    expect(draft.values.matchFramingOf).toBe(true);
    const result = applyDraft(draft, node);
    expect(result.ok && result.node.kind === 'flats' && result.node.matchFramingOf).toEqual({ kind: 'stage', stageId });
  });
});
