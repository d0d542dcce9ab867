import { FieldCell, FieldRow, RigField } from '@/components/rigs/rig-field';
import { FormSection } from '@/components/ui/form-section';
import { SwitchRow } from '@/components/ui/switch-row';
import type { RigFormState } from '@/hooks/use-rig-form';

/** The electronic focuser: step size, backlash and temperature drift. */
export function RigFocuserSection({ form }: { form: RigFormState }) {
  return (
    <FormSection title="Focuser">
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="focuser.stepSizeUm" label="Step size (µm)" placeholder="2" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="focuser.backlashSteps" label="Backlash (steps)" placeholder="0" />
        </FieldCell>
      </FieldRow>
      <RigField
        form={form}
        path="focuser.tempCoeffStepsPerC"
        label="Temperature coefficient (steps/°C)"
        placeholder="0"
        hint="Steps to move per °C of cooling; positive moves outward. 0 if unknown."
      />
    </FormSection>
  );
}

/** The camera rotator, if one is fitted: travel (cable wrap), speed and sky offset. */
export function RigRotatorSection({ form }: { form: RigFormState }) {
  const present = form.draft.rotator.present;
  return (
    <FormSection title="Rotator">
      <SwitchRow
        label="Rotator fitted"
        description="Turns the camera to a framing's position angle."
        value={present}
        onValueChange={(v) => form.set('rotator.present', v)}
        testID="rig-rotator-present"
      />
      {present ? (
        <>
          <FieldRow>
            <FieldCell>
              <RigField form={form} path="rotator.minDeg" label="Travel from (°)" placeholder="0" />
            </FieldCell>
            <FieldCell>
              <RigField form={form} path="rotator.maxDeg" label="Travel to (°)" placeholder="360" hint="At most 360° of travel, to spare the cables." />
            </FieldCell>
          </FieldRow>
          <FieldRow>
            <FieldCell>
              <RigField form={form} path="rotator.speedDegPerS" label="Rotator speed (°/s)" placeholder="5" />
            </FieldCell>
            <FieldCell>
              <RigField form={form} path="rotator.skyOffsetDeg" label="Sky offset (°)" placeholder="0" hint="Sky position angle = rotator angle + offset." />
            </FieldCell>
          </FieldRow>
        </>
      ) : null}
    </FormSection>
  );
}
