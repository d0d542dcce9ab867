import { FieldCell, FieldRow, RigField } from '@/components/rigs/rig-field';
import { FormSection } from '@/components/ui/form-section';
import type { RigFormState } from '@/hooks/use-rig-form';

/** The rig's name: how it appears in lists and plans. */
export function RigNameSection({ form }: { form: RigFormState }) {
  return (
    <FormSection title="Rig">
      <RigField form={form} path="name" label="Rig name" kind="text" placeholder="e.g. Garden refractor" hint="As it appears in lists and plans." />
    </FormSection>
  );
}

/** Telescope optics: focal length, aperture and any reducer or barlow. */
export function RigOpticsSection({ form }: { form: RigFormState }) {
  return (
    <FormSection title="Optics" description="The telescope's native values; a reducer or barlow changes the effective focal length.">
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="optics.focalLengthMm" label="Focal length (mm)" placeholder="530" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="optics.apertureMm" label="Aperture (mm)" placeholder="106" />
        </FieldCell>
      </FieldRow>
      <RigField form={form} path="optics.reducerFactor" label="Reducer or barlow factor" placeholder="1" hint="Below 1 for a reducer (e.g. 0.8), above 1 for a barlow, 1 for neither." />
    </FormSection>
  );
}
