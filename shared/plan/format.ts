/*
 * The plan format's name and version (plan-format.md): `format: nightloom.plan/<major>[.<minor>]`.
 * A reader accepts its own major version with any minor (minor versions only add fields, which
 * an older reader ignores) and refuses any other major version with a clear message.
 */

/** What this version of Nightloom writes. */
export const PLAN_FORMAT = 'nightloom.plan/1';
/** The major version this version of Nightloom reads. */
export const PLAN_MAJOR = 1;

/** Limits of an imported plan: bytes, YAML nodes and nesting, aliases, reported issues. */
export const PLAN_LIMITS = {
  /** 2 MiB: a full 2000-step recipe with a 720-point horizon stays well under it. */
  maxBytes: 2 * 1024 * 1024,
  /** YAML nodes (mappings, sequences, scalars, aliases) in the whole document. */
  maxYamlNodes: 200_000,
  /** Nesting of YAML collections; a deepest legal plan needs about 30. */
  maxYamlDepth: 64,
  /** Alias expansions the YAML reader allows (no "billion laughs"). */
  maxAliasCount: 50,
  /** Issues reported for one document; the rest are counted. */
  maxIssues: 50,
} as const;

const FORMAT_RE = /^nightloom\.plan\/(\d+)(?:\.(\d+))?$/;

export type FormatCheck = { ok: true; major: number; minor: number } | { ok: false; message: string };

/**
 * Reads the `format` value: our own major version (any minor) is fine; another major
 * version or anything else is refused with a sentence that says what this reader expects.
 */
export function checkFormat(value: unknown): FormatCheck {
  if (value === undefined) return { ok: false, message: `Not a Nightloom plan: the first key must be "format: ${PLAN_FORMAT}"` };
  const match = typeof value === 'string' ? FORMAT_RE.exec(value.trim()) : null;
  if (!match) return { ok: false, message: `Not a Nightloom plan: format is ${JSON.stringify(value)}; expected ${PLAN_FORMAT}` };
  const major = Number(match[1]);
  const minor = Number(match[2] ?? 0);
  if (major !== PLAN_MAJOR) {
    const hint = major > PLAN_MAJOR ? 'it was written by a newer Nightloom; update to read it' : 'it is older than anything this Nightloom reads';
    return { ok: false, message: `This plan is format nightloom.plan/${major}, but this Nightloom reads nightloom.plan/${PLAN_MAJOR} (any 1.x): ${hint}` };
  }
  return { ok: true, major, minor };
}
