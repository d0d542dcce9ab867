import { StyleSheet, View } from 'react-native';

import { IntakeProgress } from '@/components/calibration/intake-progress';
import { IntakeResultPanel } from '@/components/calibration/intake-result';
import type { IntakeFlow } from '@/components/calibration/use-intake';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { FilePicker } from '@/components/ui/file-picker';
import { FormSection } from '@/components/ui/form-section';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { FITS_ACCEPT } from '@/lib/fits-intake';
import { spacing } from '@/constants/theme';

/** A failed upload in words; a body over the server's limit asks for fewer files. */
function uploadErrorText(error: unknown): string {
  if (isApiError(error, 413)) return 'The headers of so many files are too much to send at once: pick a night’s folder at a time.';
  return cleanError(error);
}

/**
 * "Add frames": pick FITS files or a night's folder; only the headers are read and sent, and the
 * frames are recorded as lights, darks, flats or bias for the dark library, flats and history.
 */
export function IntakeSection({ flow }: { flow: IntakeFlow }) {
  const busy = flow.phase === 'reading' || flow.phase === 'uploading';
  return (
    <FormSection
      title="Add frames"
      description="Pick the frames of a night, or its whole folder. Only each file's header is read and sent; the images stay on this computer."
      testID="intake-section"
    >
      <View style={styles.buttons}>
        <FilePicker label="Pick FITS files…" accept={FITS_ACCEPT} multiple variant="primary" onFiles={(files) => flow.pick(files, 'files')} disabled={busy} testID="intake-files" />
        <FilePicker label="Pick a folder…" directory onFiles={(files) => flow.pick(files, 'folder')} disabled={busy} testID="intake-folder" />
      </View>
      {busy ? <IntakeProgress flow={flow} /> : null}
      {flow.pickError ? <Banner tone="danger" title="Nothing to import" message={flow.pickError} testID="intake-pick-error" /> : null}
      {flow.phase === 'failed' && flow.uploadError ? (
        <Banner tone="danger" title="Nothing was recorded" message={`${uploadErrorText(flow.uploadError)} The import is all or nothing: try again when this is fixed.`} testID="intake-error" />
      ) : null}
      {flow.phase === 'done' && flow.result ? <IntakeResultPanel flow={flow} result={flow.result} /> : null}
      {flow.phase === 'idle' ? (
        <AppText variant="small" tone="faint">
          Frames need IMAGETYP, DATE-OBS and an exposure time; darks also need the sensor temperature. Files without them are listed with the reason, and the rest are recorded.
        </AppText>
      ) : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
