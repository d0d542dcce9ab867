import { describe, expect, it } from 'vitest';
import { applyDraft, type FieldErrorMap } from '@/components/recipes/node-editor/apply';
import { nodeToDraft } from '@/components/recipes/node-editor/draft';
import type { DraftValues } from '@/components/recipes/node-editor/draft-types';
import { newRuleDraft } from '@/components/recipes/node-editor/rules-draft';
import { createNode } from '@/shared/recipe/factory';
import type { NodeKind } from '@/shared/recipe/types';

let n = 0;
const newId = () => `00000000-0000-4000-9000-${String(++n).padStart(12, '0')}`;

/** The errors of a new node of `kind` with some draft fields replaced. */
function errorsAfter(kind: NodeKind, values: DraftValues): FieldErrorMap {
  const node = createNode(kind, {}, { newId });
  const draft = nodeToDraft(node);
  Object.assign(draft.values, values);
  const result = applyDraft(draft, node);
  if (result.ok) throw new Error('expected errors');
  return result.errors;
}

describe('applyDraft errors', () => {
  it('puts bad numbers under their own fields', () => {
    const errors = errorsAfter('expose', { exposureS: 'abc', count: '2.5', binning: '5', filter: ' ' });
    expect(errors).toEqual({
      exposureS: 'Exposure must be a number',
      count: 'Frame count must be a whole number',
      binning: 'Binning must be between 1 and 4',
      filter: 'Name a filter',
    });
  });

  it('treats a blank required number as missing', () => {
    expect(Object.keys(errorsAfter('cool', { setpointC: '' }))).toEqual(['setpointC']);
  });

  it('puts a bad union branch under the branch field with its own message', () => {
    expect(errorsAfter('repeat', { 'until.mode': 'count', 'until.count': '0' })).toEqual({ 'until.count': 'Repeat count must be between 1 and 10000' });
    expect(errorsAfter('repeat', { 'until.mode': 'clock', 'until.clock': '25:00' })['until.clock']).toMatch(/^Use a time as HH:MM/);
    expect(Object.keys(errorsAfter('wait', { 'until.mode': 'durationS', 'until.durationS': '-1' }))).toEqual(['until.durationS']);
    expect(Object.keys(errorsAfter('rotate', { 'to.mode': 'positionAngleDeg', 'to.positionAngleDeg': '360' }))).toEqual(['to.positionAngleDeg']);
  });

  it('names nested stage paths', () => {
    const errors = errorsAfter('stage', {
      'framing.mode': 'custom',
      'framing.raDeg': '400',
      'framing.decDeg': '12',
      'window.notBefore.mode': 'clock',
      'window.notBefore': '9pm',
      'window.minAltitudeDeg': '95',
      'window.maxMoonIlluminationPct': 'x',
    });
    expect(Object.keys(errors).sort()).toEqual(['framing.raDeg', 'window.maxMoonIlluminationPct', 'window.minAltitudeDeg', 'window.notBefore']);
  });

  it('asks for a clock time when a window edge is set to a clock time', () => {
    const message = 'Use a time as HH:MM (24-hour, local at the site) or ISO 8601 with an offset';
    expect(errorsAfter('stage', { 'window.endBy.mode': 'clock', 'window.endBy': '26:00' })).toEqual({ 'window.endBy': message });
    expect(errorsAfter('stage', { 'window.notBefore.mode': 'clock', 'window.notBefore': '' })).toEqual({ 'window.notBefore': message });
  });

  it('reports coordinate text the parser cannot read', () => {
    const errors = errorsAfter('slew', { 'to.kind': 'radec', 'to.raDeg': '25:00:00', 'to.decDeg': '91' });
    expect(errors['to.raDeg']).toMatch(/below 24/);
    expect(errors['to.decDeg']).toMatch(/Declination/);
  });

  it('puts a bad list item under the list field', () => {
    expect(errorsAfter('darks', { exposuresS: '300, x' })).toEqual({ exposuresS: 'Dark exposure must be a number' });
    expect(errorsAfter('darks', { exposuresS: ' ' })).toEqual({ exposuresS: 'Give at least one exposure' });
    expect(errorsAfter('flats', { filters: '' })).toEqual({ filters: 'Choose at least one filter' });
  });

  it('names rule fields by index', () => {
    const node = createNode('group', {}, { newId });
    const draft = nodeToDraft(node);
    draft.rules = [
      { ...newRuleDraft('refocus-on-temperature', newId()), deltaC: '20' },
      { ...newRuleDraft('refocus-on-interval', newId()), everyMode: 'frames', everyValue: '1.5' },
      { ...newRuleDraft('recentre-on-drift', newId()), driftArcmin: '' },
    ];
    const result = applyDraft(draft, node);
    expect(result.ok ? {} : Object.keys(result.errors).sort()).toEqual(['rules.0.deltaC', 'rules.1.every.frames', 'rules.2.driftArcmin']);
  });

  it('checks the label of every node', () => {
    expect(errorsAfter('park', { label: 'x'.repeat(81) })).toEqual({ label: 'A label has at most 80 characters' });
  });
});
