/** Synthetic camera frames and intake helpers for the calibration and history API tests. */
import { sql } from 'drizzle-orm';
import { expect } from 'vitest';
import type { Database } from '@/db/client';
import { createNode } from '@/shared/recipe/factory';
import type { RecipeNode } from '@/shared/recipe/types';
import { buildFits, cameraFrame, cameraFrameCards, type CameraFrameSpec } from '@/tests/helpers/fits';
import { ORIGIN, type TestUser } from './harness';

export interface IntakeFile {
  name: string;
  headerBase64: string;
}

/** A file as the client sends it: its header bytes, standard base64. */
export const asFile = (name: string, bytes: Uint8Array): IntakeFile => ({ name, headerBase64: Buffer.from(bytes).toString('base64') });

export const frameFile = (name: string, spec: CameraFrameSpec): IntakeFile => asFile(name, cameraFrame(spec));

/** "YYYY-MM-DDThh:mm:ss" `minutes` after a start. */
export function dateObs(startIso: string, minutes: number): string {
  return new Date(Date.parse(`${startIso}Z`) + minutes * 60_000).toISOString().slice(0, 19);
}

/** Camera settings shared by the lights and darks of these tests (gain 0 and offset 50 are the default rig's first presets). */
export const CAMERA = { gain: 0, offset: 50, binning: 1, setTempC: -10, sensorTempC: -10.1 } as const;

/** `count` darks of `exposureS` at −10 °C, one a minute from `start`. */
export function darks(prefix: string, start: string, count: number, exposureS = 120, extra: Partial<CameraFrameSpec> = {}): IntakeFile[] {
  return Array.from({ length: count }, (_, i) => frameFile(`${prefix}_${String(i + 1).padStart(4, '0')}.fits`, { type: 'Dark Frame', dateObs: dateObs(start, i * 3), exposureS, ...CAMERA, ...extra }));
}

/** A light of a plate-solved sub. */
export function light(name: string, spec: Omit<CameraFrameSpec, 'type'>): IntakeFile {
  return frameFile(name, { type: 'Light Frame', ...CAMERA, ...spec });
}

export function flat(name: string, spec: Omit<CameraFrameSpec, 'type'>): IntakeFile {
  return frameFile(name, { type: 'Flat Field', ...CAMERA, exposureS: 1.5, ...spec });
}

/** A frame with every camera keyword but IMAGETYP. */
export function noImageType(name: string, spec: CameraFrameSpec): IntakeFile {
  return asFile(name, buildFits(cameraFrameCards(spec).filter((c) => typeof c === 'string' || c.key !== 'IMAGETYP')));
}

export async function intake(u: TestUser, files: IntakeFile[]) {
  return u.agent.post('/api/calibration/intake').set('Origin', ORIGIN).send({ files });
}

/** Intake that must succeed; returns the result. */
export async function intakeOk(u: TestUser, files: IntakeFile[]) {
  const res = await intake(u, files);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as { intakeId: string; recorded: Record<'light' | 'dark' | 'flat' | 'bias', number>; duplicates: number; rejected: { name: string; reason: string; kind: string }[] };
}

/** Frames the database holds for a user (the ground truth behind "nothing stored"). */
export async function frameCount(db: Database, ownerId: string): Promise<number> {
  const rows = await db.execute<{ n: string }>(sql`select count(*)::text as n from capture_frame where owner_id = ${ownerId}`);
  return Number(rows.rows[0]!.n);
}

export async function recipeCount(db: Database, ownerId: string): Promise<number> {
  const rows = await db.execute<{ n: string }>(sql`select count(*)::text as n from recipe where owner_id = ${ownerId}`);
  return Number(rows.rows[0]!.n);
}

export async function makeTarget(u: TestUser, body: { designation: string; name: string; type?: string; raDeg: number; decDeg: number; aliases?: string[] }): Promise<string> {
  const res = await u.agent.post('/api/targets').set('Origin', ORIGIN).send({ type: 'galaxy', majorArcmin: 30, ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.target.id as string;
}

/**
 * A night on M31 (2026-10-12 at the test site: new Moon): cool to −10 °C (the default set-point),
 * then a guided stage of 5 × 120 s L after astronomical dusk, warm and park.
 */
export function m31Night(targetId: string): { children: RecipeNode[] } {
  const stage: RecipeNode = {
    ...createNode('stage', { targetId, window: { notBefore: 'astronomical-dusk' } }),
    children: [createNode('slew', {}), createNode('guide', {}), createNode('meridian', { policy: { kind: 'flip' } }), createNode('expose', { filter: 'L', exposureS: 120, count: 5 })],
  };
  return { children: [createNode('cool', {}), stage, createNode('warm', {}), createNode('park', {})] };
}
