import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/banner';
import { FilePicker } from '@/components/ui/file-picker';
import { useFitsFramingMutation, type FitsFramingResult } from '@/hooks/use-targets';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';
import { readFitsHeaderBytes } from '@/shared/fits/header';

type FitsFramingPickerProps = { onRead: (result: FitsFramingResult, fileName: string) => void };

/** "Object M 31 · Ha · 300 s · 1.46″/px" from what the header said. */
export function fitsSummary({ framing, frame }: FitsFramingResult): string {
  const parts = [
    frame.object ? `Object ${frame.object}` : null,
    frame.filter ? `filter ${frame.filter}` : null,
    typeof frame.exposureS === 'number' ? `${frame.exposureS} s exposure` : null,
    `${framing.pixelScaleArcsecPerPx.toFixed(2)}″/px`,
    framing.mirrored ? 'mirrored' : null,
  ];
  return parts.filter(Boolean).join(' · ');
}

async function headerOf(file: File): Promise<Uint8Array> {
  // Only the header blocks are read (a light frame can be 100 MB); the server parses them.
  return readFitsHeaderBytes(async (start, end) => new Uint8Array(await file.slice(start, end).arrayBuffer()));
}

/** Reads the centre and position angle from an earlier image's FITS header (WCS keywords). */
export function FitsFramingPicker({ onRead }: FitsFramingPickerProps) {
  const fits = useFitsFramingMutation();
  const [reading, setReading] = useState(false);
  const [failure, setFailure] = useState<{ fileName: string; message: string } | null>(null);
  const [read, setRead] = useState<{ fileName: string; summary: string } | null>(null);

  async function onFiles(files: File[]) {
    const file = files[0];
    if (!file) return;
    setFailure(null);
    setRead(null);
    setReading(true);
    try {
      const bytes = await headerOf(file);
      const result = await fits.mutateAsync(bytes);
      setRead({ fileName: file.name, summary: fitsSummary(result) });
      onRead(result, file.name);
    } catch (e) {
      setFailure({ fileName: file.name, message: cleanError(e) });
    } finally {
      setReading(false);
    }
  }

  return (
    <View style={styles.box}>
      <View style={styles.row}>
        <FilePicker label="Take from a FITS file…" accept=".fit,.fits,.fts" onFiles={onFiles} pending={reading} size="small" testID="framing-fits" />
      </View>
      {failure ? <Banner tone="danger" title={`Could not read ${failure.fileName}`} message={failure.message} testID="framing-fits-error" /> : null}
      {read ? <Banner tone="ok" title={`Taken from ${read.fileName}`} message={read.summary} testID="framing-fits-summary" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { flexDirection: 'row' },
});
