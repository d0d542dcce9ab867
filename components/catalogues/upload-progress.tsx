import { formatBytes } from '@/components/catalogues/import-flow';
import { ProgressBar } from '@/components/ui/progress-bar';
import { uploadShare } from '@/components/ui/upload-share';
import type { UploadProgress as Progress } from '@/lib/upload';

/** A bar while the file uploads, then a note while the server reads and stores it. */
export function UploadProgress({ progress }: { progress: Progress | null }) {
  const share = uploadShare(progress);
  const caption = share.sent
    ? 'Uploaded. Reading and storing the objects…'
    : share.started
      ? `Uploading ${formatBytes(share.loadedBytes)} of ${formatBytes(share.totalBytes)}`
      : 'Uploading…';
  return (
    <ProgressBar
      fraction={share.fraction}
      label="Upload"
      caption={caption}
      done={share.sent}
      testID="catalogue-progress"
      captionTestID={share.sent ? 'catalogue-processing' : 'catalogue-uploading'}
    />
  );
}
