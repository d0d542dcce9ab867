import { useState } from 'react';

import { useCataloguePreviewMutation, useImportCatalogueMutation } from '@/hooks/use-catalogues';
import { readFileText } from '@/lib/files';
import type { CsvMapping } from '@/shared/targets/csv-import';

/** The server takes catalogue bodies up to 16 MB. */
export const MAX_CSV_BYTES = 16 * 1024 * 1024;

export type ChosenFile = { name: string; sizeBytes: number; text: string };

/** "3.9 MB", "12 kB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1_048_576) return `${(bytes / 1_048_576).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} kB`;
}

/** "NGC.csv" → "NGC". */
export function suggestedName(fileName: string): string {
  return fileName.replace(/\.[^.]+$/, '').slice(0, 80);
}

/** The chosen file's text, or why it cannot be used. */
async function readCsv(chosen: File): Promise<ChosenFile | string> {
  if (chosen.size > MAX_CSV_BYTES) return `${chosen.name} is larger than 16 MB. Split it into smaller files.`;
  try {
    return { name: chosen.name, sizeBytes: chosen.size, text: await readFileText(chosen) };
  } catch {
    return `Could not read ${chosen.name}.`;
  }
}

/**
 * The import's steps in one place: read the chosen file, preview it on the server (again after
 * the mapping is edited), then upload it for good with progress.
 */
export function useImportFlow() {
  const [file, setFile] = useState<ChosenFile | null>(null);
  const [readError, setReadError] = useState<string | null>(null);
  const [reading, setReading] = useState(false);
  // The mapping being edited; null until a preview answered (then it starts as the detected one).
  const [mapping, setMapping] = useState<CsvMapping | null>(null);
  const [mappingEdited, setMappingEdited] = useState(false);
  const preview = useCataloguePreviewMutation();
  const upload = useImportCatalogueMutation();

  function runPreview(text: string, withMapping?: CsvMapping) {
    preview.mutate(
      { csv: text, mapping: withMapping },
      {
        onSuccess: (p) => {
          setMapping(p.layout.mapping);
          setMappingEdited(false);
        },
      },
    );
  }

  async function choose(chosen: File) {
    restart();
    setReading(true);
    const read = await readCsv(chosen);
    setReading(false);
    if (typeof read === 'string') return setReadError(read);
    setFile(read);
    runPreview(read.text);
  }

  function editMapping(next: CsvMapping) {
    setMapping(next);
    setMappingEdited(true);
  }

  function recheck() {
    if (file && mapping) runPreview(file.text, mapping);
  }

  function startImport(name: string, clubId: string | undefined, acceptErrors: boolean, onError?: (e: unknown) => void) {
    if (!file) return;
    // A generic file goes with the mapping its last preview used; OpenNGC's layout is fixed.
    const edited = mapping && mapping.layout === 'generic' ? mapping : undefined;
    upload.mutate({ csv: file.text, name, clubId, mapping: edited, acceptErrors }, { onError });
  }

  function restart() {
    setFile(null);
    setMapping(null);
    setReadError(null);
    preview.reset();
    upload.reset();
  }

  return { file, reading, readError, preview, mapping, mappingEdited, editMapping, recheck, choose, upload, startImport, restart };
}

export type ImportFlow = ReturnType<typeof useImportFlow>;
