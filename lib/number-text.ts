/** Text to number; accepts a decimal comma and a typographic minus. Empty or junk gives NaN. */
export function parseNumberText(text: string): number {
  const normalised = text.trim().replace(',', '.').replace('\u2212', '-');
  if (normalised === '' || !/^[-+]?(\d+\.?\d*|\.\d+)$/.test(normalised)) return Number.NaN;
  return Number(normalised);
}
