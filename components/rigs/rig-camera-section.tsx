import { RigModeList, RigPresetList } from '@/components/rigs/rig-camera-presets';
import type { LinkKind } from '@/components/rigs/rig-draft';
import { FieldCell, FieldRow, RigField } from '@/components/rigs/rig-field';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { FormSection } from '@/components/ui/form-section';
import type { RigFormState } from '@/hooks/use-rig-form';

const LINK_CHOICES = [
  { value: 'usb3', label: 'USB 3' },
  { value: 'usb2', label: 'USB 2' },
  { value: 'measured', label: 'Measured time' },
] as const satisfies readonly { value: LinkKind; label: string }[];

/** The main camera: sensor, link, cooling and its named gain/offset settings. */
export function RigCameraSection({ form }: { form: RigFormState }) {
  const linkKind = form.draft.camera.link.kind;
  return (
    <FormSection title="Camera" description="The imaging camera at full resolution (binning 1).">
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="camera.sensorWidthPx" label="Sensor width (px)" placeholder="6248" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="camera.sensorHeightPx" label="Sensor height (px)" placeholder="4176" />
        </FieldCell>
      </FieldRow>
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="camera.pixelSizeUm" label="Pixel size (µm)" placeholder="3.76" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="camera.bitDepth" label="Bit depth (bits)" placeholder="16" hint="Above 8 bits a pixel takes 2 bytes." />
        </FieldCell>
      </FieldRow>
      <ChoiceGroup<LinkKind>
        label="Download link"
        choices={LINK_CHOICES}
        value={linkKind}
        onChange={(v) => form.set('camera.link.kind', v)}
        hint={linkKind === 'measured' ? undefined : 'Sets the download time per frame; measure it on your rig for the best estimate.'}
        testID="rig-camera-link"
      />
      {linkKind === 'measured' ? (
        <RigField form={form} path="camera.link.measuredDownloadS" errorParent="camera.link" label="Measured download time (s)" placeholder="0.8" hint="One full frame, as your capture software reports it." />
      ) : null}
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="camera.cooling.maxDeltaBelowAmbientC" label="Largest drop below ambient (°C)" placeholder="30" hint="0 for an uncooled camera." />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="camera.cooling.rateCPerMin" label="Cooling rate (°C/min)" placeholder="3" />
        </FieldCell>
      </FieldRow>
      <RigPresetList form={form} list="camera.gainPresets" title="Gain presets" noun="gain" />
      <RigPresetList form={form} list="camera.offsetPresets" title="Offset presets" noun="offset" />
      <RigModeList form={form} />
    </FormSection>
  );
}
