import { useZodForm } from '@/hooks/use-zod-form';
import { deviceTimeZone } from '@/lib/format';
import { siteInputSchema, type SiteInput } from '@/shared/schemas/site';

/** The site form's raw values: numbers stay text until parsed, so typing "-4" or "47," works. */
export type SiteFormValues = {
  name: string;
  latitudeDeg: string;
  longitudeDeg: string;
  elevationM: string;
  timeZone: string;
  isDefault: boolean;
};

/** Text to number; accepts a decimal comma and a typographic minus. Empty or junk gives NaN. */
export function parseNumberText(text: string): number {
  const normalised = text.trim().replace(',', '.').replace('\u2212', '-');
  if (normalised === '' || !/^[-+]?(\d+\.?\d*|\.\d+)$/.test(normalised)) return Number.NaN;
  return Number(normalised);
}

function toInput(values: SiteFormValues) {
  return {
    name: values.name,
    latitudeDeg: parseNumberText(values.latitudeDeg),
    longitudeDeg: parseNumberText(values.longitudeDeg),
    elevationM: parseNumberText(values.elevationM),
    timeZone: values.timeZone,
    isDefault: values.isDefault,
  };
}

export function siteFormValues(site: SiteInput | undefined): SiteFormValues {
  if (!site) return { name: '', latitudeDeg: '', longitudeDeg: '', elevationM: '', timeZone: deviceTimeZone(), isDefault: false };
  return {
    name: site.name,
    latitudeDeg: String(site.latitudeDeg),
    longitudeDeg: String(site.longitudeDeg),
    elevationM: String(site.elevationM),
    timeZone: site.timeZone,
    isDefault: site.isDefault,
  };
}

/** Form state for a site, validated by the shared `siteInputSchema` (the API checks the same). */
export function useSiteForm(initial: SiteInput | undefined) {
  return useZodForm({ schema: siteInputSchema, initial: siteFormValues(initial), toInput });
}

export type SiteFormState = ReturnType<typeof useSiteForm>;
