import { DraftChoice, DraftSwitch, DraftText, FieldGrid } from '@/components/recipes/node-editor/editor-field';
import { FilterPicker } from '@/components/recipes/node-editor/filter-pickers';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';

const SLEW_TO = [
  { value: 'stage-target', label: 'Stage target' },
  { value: 'radec', label: 'RA/Dec' },
  { value: 'altaz', label: 'Alt/Az' },
];

export function SlewForm({ ed }: KindFormProps) {
  const to = ed.values['to.kind'];
  return (
    <>
      <DraftChoice ed={ed} path="to.kind" label="Slew to" choices={SLEW_TO} />
      {to === 'radec' ? (
        <FieldGrid>
          <DraftText ed={ed} path="to.raDeg" label="RA (°)" inputMode="decimal" hint="Degrees, or hours as 05:35:17." />
          <DraftText ed={ed} path="to.decDeg" label="Dec (°)" inputMode="decimal" hint="Degrees, or −05:23:28." />
        </FieldGrid>
      ) : null}
      {to === 'altaz' ? (
        <FieldGrid>
          <DraftText ed={ed} path="to.altDeg" label="Altitude (°)" numeric hint="Above the horizon, e.g. a flat panel." />
          <DraftText ed={ed} path="to.azDeg" label="Azimuth (°)" numeric hint="From north through east." />
        </FieldGrid>
      ) : null}
    </>
  );
}

export function CentreForm({ ed, rig }: KindFormProps) {
  return (
    <>
      <FieldGrid>
        <DraftText ed={ed} path="toleranceArcsec" label="Tolerance (″)" numeric />
        <DraftText ed={ed} path="maxAttempts" label="Attempts" inputMode="numeric" />
        <DraftText ed={ed} path="solveExposureS" label="Solve exposure (s)" numeric />
      </FieldGrid>
      <FilterPicker ed={ed} rig={rig} label="Solve filter" optional />
    </>
  );
}

const ROTATE_TO = [
  { value: 'matchFraming', label: 'Match the framing' },
  { value: 'positionAngleDeg', label: 'Position angle' },
];

export function RotateForm({ ed }: KindFormProps) {
  return (
    <>
      <DraftChoice ed={ed} path="to.mode" label="Rotate to" choices={ROTATE_TO} />
      <FieldGrid>
        {ed.values['to.mode'] === 'positionAngleDeg' ? <DraftText ed={ed} path="to.positionAngleDeg" label="Position angle (°)" numeric hint="East of north, 0–360." /> : null}
        <DraftText ed={ed} path="toleranceArcmin" label="Tolerance (′)" numeric />
      </FieldGrid>
    </>
  );
}

export function GuideForm({ ed }: KindFormProps) {
  return (
    <>
      <FieldGrid>
        <DraftText ed={ed} path="settlePx" label="Settle within (px)" numeric />
        <DraftText ed={ed} path="settleTimeS" label="Settle time (s)" numeric />
      </FieldGrid>
      <DraftSwitch ed={ed} path="calibrate" label="Calibrate first" description="Measure the guide directions before guiding starts." />
    </>
  );
}

const POLICIES = [
  { value: 'flip', label: 'Flip' },
  { value: 'pause-before', label: 'Pause before' },
  { value: 'end-stage', label: 'End stage' },
];

export function MeridianForm({ ed }: KindFormProps) {
  const policy = ed.values['policy.kind'];
  return (
    <>
      <DraftChoice ed={ed} path="policy.kind" label="At the meridian" choices={POLICIES} />
      {policy === 'flip' ? (
        <>
          <DraftText ed={ed} path="policy.flipAfterMin" label="Flip after (min)" numeric hint="Minutes past the meridian." />
          <DraftSwitch ed={ed} path="policy.recentre" label="Recentre after the flip" />
          <DraftSwitch ed={ed} path="policy.refocus" label="Refocus after the flip" />
        </>
      ) : null}
      {policy === 'pause-before' ? <DraftText ed={ed} path="policy.minutesBefore" label="Pause before (min)" numeric hint="Stop imaging this long before the crossing." /> : null}
    </>
  );
}
