/** Reads a chosen file as UTF-8 text (a leading byte-order mark is dropped). */
export async function readFileText(file: Blob): Promise<string> {
  const text =
    typeof file.text === 'function'
      ? await file.text()
      : await new Promise<string>((resolve, reject) => {
          const reader = new FileReader();
          reader.onload = () => resolve(String(reader.result ?? ''));
          reader.onerror = () => reject(reader.error ?? new Error('Could not read the file.'));
          reader.readAsText(file);
        });
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}

/** Starts a download of `text` as a file (web only; a no-op elsewhere). */
export function downloadText(filename: string, text: string, type = 'text/csv'): void {
  if (typeof document === 'undefined') return;
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
