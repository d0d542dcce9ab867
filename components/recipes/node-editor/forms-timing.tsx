import { SUN_EVENT_CHOICES, switchWhenMode } from '@/components/recipes/node-editor/choices';
import { DraftChoice, DraftText } from '@/components/recipes/node-editor/editor-field';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import { parseNumberText } from '@/lib/number-text';
import { formatDurationS } from '@/shared/recipe/format';

const REPEAT_UNTIL = [
  { value: 'count', label: 'Count' },
  { value: 'clock', label: 'Clock time' },
  { value: 'altitudeBelowDeg', label: 'Target sinks' },
  { value: 'sunEvent', label: 'Sun event' },
];

const clockField = (ed: NodeEditorState, path: string, label: string) => <DraftText ed={ed} path={path} label={label} placeholder="HH:MM" inputMode="numeric" hint="Local time at the site, 24-hour." />;
const sunField = (ed: NodeEditorState, path: string, label = 'Sun event') => <DraftChoice ed={ed} path={path} label={label} choices={SUN_EVENT_CHOICES} select />;

export function RepeatForm({ ed }: KindFormProps) {
  const mode = ed.values['until.mode'];
  return (
    <>
      <DraftChoice ed={ed} path="until.mode" label="Repeat until" choices={REPEAT_UNTIL} />
      {mode === 'count' ? <DraftText ed={ed} path="until.count" label="Times" inputMode="numeric" placeholder="10" /> : null}
      {mode === 'clock' ? clockField(ed, 'until.clock', 'Until (HH:MM)') : null}
      {mode === 'altitudeBelowDeg' ? <DraftText ed={ed} path="until.altitudeBelowDeg" label="Target below (°)" numeric hint="Altitude of the stage's target." /> : null}
      {mode === 'sunEvent' ? sunField(ed, 'until.sunEvent') : null}
    </>
  );
}

const WAIT_UNTIL = [
  { value: 'sunEvent', label: 'Sun event' },
  { value: 'clock', label: 'Clock time' },
  { value: 'altitudeAboveDeg', label: 'Target rises' },
  { value: 'durationS', label: 'Duration' },
];

function durationHint(text: unknown): string {
  const s = typeof text === 'string' ? parseNumberText(text) : Number.NaN;
  return Number.isFinite(s) && s > 0 ? `That is ${formatDurationS(s)}.` : 'In seconds, e.g. 600 for 10 min.';
}

export function WaitForm({ ed }: KindFormProps) {
  const mode = ed.values['until.mode'];
  return (
    <>
      <DraftChoice ed={ed} path="until.mode" label="Wait until" choices={WAIT_UNTIL} />
      {mode === 'clock' ? clockField(ed, 'until.clock', 'Until (HH:MM)') : null}
      {mode === 'sunEvent' ? sunField(ed, 'until.sunEvent') : null}
      {mode === 'altitudeAboveDeg' ? <DraftText ed={ed} path="until.altitudeAboveDeg" label="Target above (°)" numeric hint="Altitude of the stage's target." /> : null}
      {mode === 'durationS' ? <DraftText ed={ed} path="until.durationS" label="Duration (s)" numeric hint={durationHint(ed.values['until.durationS'])} /> : null}
    </>
  );
}

const WHEN = [
  { value: 'none', label: 'Any time' },
  { value: 'sun', label: 'Sun event' },
  { value: 'clock', label: 'Clock time' },
];

type WhenFieldProps = { ed: NodeEditorState; path: string; label: string; defaultEvent: string };

/** A window edge: no limit, a named sun event, or a clock time. */
export function WhenField({ ed, path, label, defaultEvent }: WhenFieldProps) {
  const mode = ed.values[`${path}.mode`];
  return (
    <>
      <DraftChoice ed={ed} path={`${path}.mode`} label={label} choices={WHEN} onChange={(m) => ed.setValues((v) => switchWhenMode(v, path, m, defaultEvent))} />
      {mode === 'sun' ? sunField(ed, path, `${label} (sun event)`) : null}
      {mode === 'clock' ? clockField(ed, path, `${label} (HH:MM)`) : null}
    </>
  );
}
