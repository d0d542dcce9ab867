import { useHorizonTable } from '@/hooks/use-horizon-table';
import { useZodForm } from '@/hooks/use-zod-form';
import type { FieldErrors } from '@/lib/api';
import { deviceTimeZone } from '@/lib/format';
import { parseNumberText } from '@/lib/number-text';
import { siteInputSchema, type SiteInput } from '@/shared/schemas/site';

/** The site form's raw values: numbers stay text until parsed, so typing "-4" or "47," works. */
export type SiteFormValues = {
  name: string;
  latitudeDeg: string;
  longitudeDeg: string;
  elevationM: string;
  timeZone: string;
  isDefault: boolean;
  minAltitudeDeg: string;
  duskTempC: string;
  dawnTempC: string;
};

/** Everything but the horizon, which the horizon table edits and checks by row. */
const siteFieldsSchema = siteInputSchema.omit({ horizon: true });

// Kept importable from here: other forms read numbers the same way.

function toInput(values: SiteFormValues) {
  return {
    name: values.name,
    latitudeDeg: parseNumberText(values.latitudeDeg),
    longitudeDeg: parseNumberText(values.longitudeDeg),
    elevationM: parseNumberText(values.elevationM),
    timeZone: values.timeZone,
    isDefault: values.isDefault,
    minAltitudeDeg: parseNumberText(values.minAltitudeDeg),
    duskTempC: parseNumberText(values.duskTempC),
    dawnTempC: parseNumberText(values.dawnTempC),
  };
}

/** A new site starts with the schema's defaults (30° minimum altitude is common practice). */
const NEW_SITE = siteFieldsSchema.pick({ minAltitudeDeg: true, duskTempC: true, dawnTempC: true }).parse({});

export function siteFormValues(site: SiteInput | undefined): SiteFormValues {
  const s = site ?? { name: '', timeZone: deviceTimeZone(), isDefault: false, ...NEW_SITE };
  const text = (n: number | undefined) => (n === undefined ? '' : String(n));
  return {
    name: s.name,
    latitudeDeg: text(site?.latitudeDeg),
    longitudeDeg: text(site?.longitudeDeg),
    elevationM: text(site?.elevationM),
    timeZone: s.timeZone,
    isDefault: s.isDefault,
    minAltitudeDeg: text(s.minAltitudeDeg),
    duskTempC: text(s.duskTempC),
    dawnTempC: text(s.dawnTempC),
  };
}

/**
 * Form state for a site, validated by the shared `siteInputSchema` (the API checks the same):
 * the plain fields through `useZodForm`, the horizon through its own table. Every field the
 * site carries is in the form, so saving never drops one (the horizon above all).
 */
export function useSiteForm(initial: SiteInput | undefined) {
  const fields = useZodForm({ schema: siteFieldsSchema, initial: siteFormValues(initial), toInput });
  const horizon = useHorizonTable(initial?.horizon ?? []);

  /** Marks everything touched; returns the whole site input, or null when something is invalid. */
  function validate(): SiteInput | null {
    const plain = fields.validate();
    const points = horizon.validate();
    return plain && points ? { ...plain, horizon: points } : null;
  }

  /** Server field errors: `horizon.*` keys go to the table, the rest under their fields. */
  function setServerErrors(errors: FieldErrors) {
    const entries = Object.entries(errors);
    fields.setServerErrors(Object.fromEntries(entries.filter(([k]) => !k.startsWith('horizon'))));
    horizon.setServerErrors(Object.fromEntries(entries.filter(([k]) => k.startsWith('horizon'))));
  }

  function resetTo(site: SiteInput) {
    fields.reset(siteFormValues(site));
    horizon.reset(site.horizon);
  }

  return { ...fields, horizon, validate, setServerErrors, resetTo };
}

export type SiteFormState = ReturnType<typeof useSiteForm>;
