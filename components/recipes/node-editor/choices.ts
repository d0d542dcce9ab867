import type { DraftValues } from '@/components/recipes/node-editor/draft-types';
import { textOf } from '@/components/recipes/node-editor/draft-types';
import type { EditorFraming, EditorTarget } from '@/components/recipes/node-editor/editor-types';
import { isSunEvent, SUN_EVENTS } from '@/shared/recipe/fields';
import type { RigInput } from '@/shared/rig/schema';

export type Option = { value: string; label: string };

/** "astronomical-dusk" → "Astronomical dusk". */
export function sunEventLabel(event: string): string {
  const words = event.replace('-', ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export const SUN_EVENT_CHOICES: Option[] = SUN_EVENTS.map((e) => ({ value: e, label: sunEventLabel(e) }));

/** The names in a comma list, in order, without blanks. */
export function listNames(text: string): string[] {
  return text
    .split(/[,;]/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

/** The comma list with `name` added at the end, or removed when present. */
export function toggleName(text: string, name: string): string {
  const names = listNames(text);
  const next = names.includes(name) ? names.filter((n) => n !== name) : [...names, name];
  return next.join(', ');
}

/**
 * Filter choices from the rig's wheel, in slot order. A name the wheel lacks (a shared
 * template's band name) stays choosable, marked; `blankLabel` adds a "no filter" choice first.
 */
export function filterChoices(rig: Pick<RigInput, 'filterWheel'> | undefined, current: string[], blankLabel?: string): Option[] {
  const slots = rig?.filterWheel.slots.map((s) => s.name) ?? [];
  const missing = current.filter((name) => name !== '' && !slots.includes(name));
  return [
    ...(blankLabel ? [{ value: '', label: blankLabel }] : []),
    ...slots.map((name) => ({ value: name, label: name })),
    ...missing.map((name) => ({ value: name, label: `${name} (not in wheel)` })),
  ];
}

/** The rig camera's named presets as quick picks, e.g. "Unity 100". */
export function presetChips(rig: RigInput | undefined, which: 'gain' | 'offset'): Option[] {
  const presets = which === 'gain' ? rig?.camera.gainPresets : rig?.camera.offsetPresets;
  return (presets ?? []).map((p) => ({ value: String(p.value), label: `${p.name} ${p.value}` }));
}

export function targetLabel(t: EditorTarget): string {
  return t.name && t.name !== t.designation ? `${t.designation} · ${t.name}` : t.designation;
}

/** Target picker: none, then the user's targets. A stage's target not in the list stays shown. */
export function targetChoices(targets: readonly EditorTarget[], currentId: string): Option[] {
  const known = targets.map((t) => ({ value: t.id, label: targetLabel(t) }));
  const unknown = currentId !== '' && !targets.some((t) => t.id === currentId) ? [{ value: currentId, label: 'A target not in your list' }] : [];
  return [{ value: '', label: 'No target' }, ...known, ...unknown];
}

/** Framing choices: the target's own, each recorded framing, or typed values. */
export function framingChoices(target: EditorTarget | undefined): Option[] {
  const recorded = (target?.framings ?? []).map((f) => ({ value: f.id, label: f.name }));
  return [{ value: 'none', label: target ? "Target's own" : 'None' }, ...recorded, { value: 'custom', label: 'Enter RA/Dec/PA' }];
}

/** Picks a framing choice: a recorded framing copies its centre and angle into the fields. */
export function pickFraming(values: DraftValues, choice: string, framings: readonly EditorFraming[]): DraftValues {
  const f = framings.find((x) => x.id === choice);
  if (!f) return { ...values, 'framing.mode': choice };
  return { ...values, 'framing.mode': f.id, 'framing.raDeg': String(f.raDeg), 'framing.decDeg': String(f.decDeg), 'framing.positionAngleDeg': String(f.positionAngleDeg) };
}

/** A typed framing that equals one of the target's recorded framings shows as that framing. */
export function recognizeFraming(values: DraftValues, framings: readonly EditorFraming[]): DraftValues {
  if (textOf(values, 'framing.mode') !== 'custom') return values;
  const same = framings.find(
    (f) => String(f.raDeg) === values['framing.raDeg'] && String(f.decDeg) === values['framing.decDeg'] && String(f.positionAngleDeg) === values['framing.positionAngleDeg'],
  );
  return same ? { ...values, 'framing.mode': same.id } : values;
}

/** Switches a window time between none, a sun event and a clock time, keeping what still fits. */
export function switchWhenMode(values: DraftValues, path: string, mode: string, defaultEvent: string): DraftValues {
  const current = textOf(values, path);
  const next: DraftValues = { ...values, [`${path}.mode`]: mode };
  if (mode === 'sun' && !isSunEvent(current)) next[path] = defaultEvent;
  if (mode === 'clock' && isSunEvent(current)) next[path] = '';
  return next;
}
