import { FieldCell, FieldRow, RigField } from '@/components/rigs/rig-field';
import { ChoiceGroup } from '@/components/ui/choice-group';
import { FormSection } from '@/components/ui/form-section';
import type { RigFormState } from '@/hooks/use-rig-form';
import type { MountType } from '@/shared/rig/schema';

const MOUNT_CHOICES = [
  { value: 'german-equatorial', label: 'German equatorial' },
  { value: 'fork', label: 'Fork' },
  { value: 'alt-az', label: 'Alt-az' },
] as const satisfies readonly { value: MountType; label: string }[];

/** The mount: type, slewing, settling, meridian handling and park position. */
export function RigMountSection({ form }: { form: RigFormState }) {
  const type = form.draft.mount.type;
  const altAz = type === 'alt-az';
  return (
    <FormSection title="Mount" description="Slew and settle times feed the dry run's overheads.">
      <ChoiceGroup<MountType> label="Mount type" choices={MOUNT_CHOICES} value={type} onChange={(v) => form.set('mount.type', v)} testID="rig-mount-type" />
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="mount.maxSlewRateDegPerS.axis1" label={altAz ? 'Slew rate, azimuth (°/s)' : 'Slew rate, RA (°/s)'} placeholder="3.5" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="mount.maxSlewRateDegPerS.axis2" label={altAz ? 'Slew rate, altitude (°/s)' : 'Slew rate, Dec (°/s)'} placeholder="3.5" />
        </FieldCell>
      </FieldRow>
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="mount.accelerationS" label="Time to full rate (s)" placeholder="1" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="mount.settleS" label="Settle after slew (s)" placeholder="5" />
        </FieldCell>
      </FieldRow>
      {type === 'german-equatorial' ? (
        <FieldRow>
          <FieldCell>
            <RigField form={form} path="mount.meridian.trackPastMin" label="Tracking past meridian (min)" placeholder="15" hint="Until the mount's hour-angle limit." />
          </FieldCell>
          <FieldCell>
            <RigField form={form} path="mount.meridian.flipDelayS" label="Flip delay (s)" placeholder="300" hint="After the meridian crossing." />
          </FieldCell>
        </FieldRow>
      ) : null}
      <FieldRow>
        <FieldCell>
          <RigField form={form} path="mount.park.altDeg" label="Park altitude (°)" placeholder="45" />
        </FieldCell>
        <FieldCell>
          <RigField form={form} path="mount.park.azDeg" label="Park azimuth (°)" placeholder="0" hint="From north through east." />
        </FieldCell>
      </FieldRow>
    </FormSection>
  );
}
