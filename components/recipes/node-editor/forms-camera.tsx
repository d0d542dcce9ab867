import { BINNING_CHOICES, FilterPicker, PresetField } from '@/components/recipes/node-editor/filter-pickers';
import { DraftChoice, DraftText, FieldGrid } from '@/components/recipes/node-editor/editor-field';
import type { KindFormProps } from '@/components/recipes/node-editor/form-props';
import type { RigInput } from '@/shared/rig/schema';

const rateHint = (rig?: RigInput) => (rig ? `Blank: the camera's ${rig.camera.cooling.rateCPerMin} °C/min.` : "Blank: the camera's own rate.");

export function CoolForm({ ed, rig }: KindFormProps) {
  return (
    <FieldGrid>
      <DraftText ed={ed} path="setpointC" label="Set-point (°C)" numeric placeholder="-10" />
      <DraftText ed={ed} path="maxRateCPerMin" label="Max rate (°C/min)" numeric placeholder="Camera's" hint={rateHint(rig)} />
    </FieldGrid>
  );
}

export function WarmForm({ ed, rig }: KindFormProps) {
  return (
    <FieldGrid>
      <DraftText ed={ed} path="targetC" label="Warm to (°C)" numeric placeholder="Ambient" hint="Blank: up to ambient." />
      <DraftText ed={ed} path="maxRateCPerMin" label="Max rate (°C/min)" numeric placeholder="Camera's" hint={rateHint(rig)} />
    </FieldGrid>
  );
}

export function ExposeForm({ ed, rig }: KindFormProps) {
  return (
    <>
      <FilterPicker ed={ed} rig={rig} />
      <FieldGrid>
        <DraftText ed={ed} path="exposureS" label="Exposure (s)" numeric />
        <DraftText ed={ed} path="count" label="Frames" inputMode="numeric" />
        <PresetField ed={ed} rig={rig} path="gain" which="gain" />
        <PresetField ed={ed} rig={rig} path="offset" which="offset" />
        <DraftText ed={ed} path="ditherEvery" label="Dither every (frames)" inputMode="numeric" hint="0 = never." />
      </FieldGrid>
      <DraftChoice ed={ed} path="binning" label="Binning" choices={BINNING_CHOICES} />
      <DraftChoice ed={ed} path="frameType" label="Frame type" choices={[{ value: 'light', label: 'Light' }]} hint="Calibration frames have their own steps." />
    </>
  );
}

export function DarksForm({ ed, rig }: KindFormProps) {
  return (
    <>
      <DraftText ed={ed} path="exposuresS" label="Exposures (s)" placeholder="300, 120, 60" inputMode="decimal" hint="One set per exposure; separate with commas, decimals with a point." />
      <FieldGrid>
        <DraftText ed={ed} path="count" label="Darks per exposure" inputMode="numeric" />
        <DraftText ed={ed} path="temperatureC" label="Sensor temperature (°C)" numeric />
        <PresetField ed={ed} rig={rig} path="gain" which="gain" />
        <PresetField ed={ed} rig={rig} path="offset" which="offset" />
      </FieldGrid>
      <DraftChoice ed={ed} path="binning" label="Binning" choices={BINNING_CHOICES} />
    </>
  );
}
