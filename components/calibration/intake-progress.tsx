import { readingText } from '@/components/calibration/calibration-format';
import type { IntakeFlow } from '@/components/calibration/use-intake';
import { formatBytes } from '@/components/catalogues/import-flow';
import { ProgressBar } from '@/components/ui/progress-bar';
import { uploadShare } from '@/components/ui/upload-share';

/** Headers read so far, then the upload, then a note while the server records the frames. */
export function IntakeProgress({ flow }: { flow: IntakeFlow }) {
  if (flow.phase === 'reading') {
    const { done, total } = flow.read;
    return <ProgressBar fraction={total ? done / total : 0} label="Reading headers" caption={readingText(done, total)} testID="intake-progress" captionTestID="intake-progress-text" />;
  }
  const share = uploadShare(flow.progress);
  const caption = share.sent
    ? 'Sent. Recording the frames…'
    : share.started
      ? `Sending the headers: ${formatBytes(share.loadedBytes)} of ${formatBytes(share.totalBytes)}`
      : 'Sending the headers…';
  return <ProgressBar fraction={share.fraction} label="Sending the headers" caption={caption} done={share.sent} testID="intake-progress" captionTestID="intake-progress-text" />;
}
