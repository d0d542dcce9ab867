import { FieldCell, FieldRow, RigField } from '@/components/rigs/rig-field';
import { FormSection } from '@/components/ui/form-section';
import { SwitchRow } from '@/components/ui/switch-row';
import type { RigFormState } from '@/hooks/use-rig-form';

/** The guide camera and its optics, with the settle rules used after each dither. */
export function RigGuiderSection({ form }: { form: RigFormState }) {
  const present = form.draft.guider.present;
  return (
    <FormSection title="Guider">
      <SwitchRow label="Guider fitted" description="A guide camera on a guide scope or an off-axis guider." value={present} onValueChange={(v) => form.set('guider.present', v)} testID="rig-guider-present" />
      {present ? (
        <>
          <FieldRow>
            <FieldCell>
              <RigField form={form} path="guider.pixelSizeUm" label="Guide camera pixel size (µm)" placeholder="3.75" />
            </FieldCell>
            <FieldCell>
              <RigField form={form} path="guider.focalLengthMm" label="Guide focal length (mm)" placeholder="200" hint="Off-axis guider: the main optics' effective focal length." />
            </FieldCell>
          </FieldRow>
          <FieldRow>
            <FieldCell>
              <RigField form={form} path="guider.settlePx" label="Settle threshold (px)" placeholder="1.5" hint="Guide pixels." />
            </FieldCell>
            <FieldCell>
              <RigField form={form} path="guider.settleTimeS" label="Settled for (s)" placeholder="10" />
            </FieldCell>
          </FieldRow>
          <FieldRow>
            <FieldCell>
              <RigField form={form} path="guider.settleTimeoutS" label="Settle timeout (s)" placeholder="60" />
            </FieldCell>
            <FieldCell>
              <RigField form={form} path="guider.startS" label="Guiding start (s)" placeholder="120" hint="Including calibration." />
            </FieldCell>
          </FieldRow>
        </>
      ) : null}
    </FormSection>
  );
}
