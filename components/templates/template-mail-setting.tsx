import { AppText } from '@/components/ui/app-text';
import { SwitchRow } from '@/components/ui/switch-row';
import { useAccountSettingsQuery, useSaveAccountSettingsMutation } from '@/hooks/use-account-settings';
import { cleanError } from '@/lib/clean-error';

/** The opt-out of "a template you used has a new version" mail. */
export function TemplateMailSetting() {
  const settings = useAccountSettingsQuery();
  const save = useSaveAccountSettingsMutation();
  const value = settings.data?.notifyTemplateVersions ?? true;
  return (
    <>
      <SwitchRow
        label="Mail me about new template versions"
        description="When a club template you used gets a new version."
        value={value}
        disabled={!settings.data || save.isPending}
        onValueChange={(next) => settings.data && save.mutate({ ...settings.data, notifyTemplateVersions: next })}
        testID="account-template-mail-switch"
      />
      {settings.error || save.error ? (
        <AppText variant="small" tone="danger">
          {cleanError(save.error ?? settings.error)}
        </AppText>
      ) : null}
    </>
  );
}
