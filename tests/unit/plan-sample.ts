import type { PlanInput } from '@/shared/plan';
import { defaultRigInput } from '@/shared/rig/schema';

/** Fixed ids, so samples and fixtures read the same on every run. */
export const SAMPLE_IDS = {
  target: '6f1c2a4e-3b5d-4c7e-9f10-2a3b4c5d6e7f',
  framing: '7a2b3c4d-5e6f-4a1b-8c2d-3e4f5a6b7c8d',
  cool: '11111111-1111-4111-8111-111111111111',
  stage: '22222222-2222-4222-8222-222222222222',
  focus: '33333333-3333-4333-8333-333333333333',
  repeat: '44444444-4444-4444-8444-444444444444',
  expose: '55555555-5555-4555-8555-555555555555',
  park: '66666666-6666-4666-8666-666666666666',
  rule: '77777777-7777-4777-8777-777777777777',
  recipe: '88888888-8888-4888-8888-888888888888',
};

/** A small, valid plan: one stage on M31 in L, a focus rule, cooling and parking. */
export function samplePlan(): PlanInput {
  const id = SAMPLE_IDS;
  return {
    format: 'nightloom.plan/1',
    meta: { title: 'Andromeda in L · 2026-10-10', author: 'Test Imager', created: '2026-10-01T20:00:00+02:00', sourceRecipeId: id.recipe, generator: 'Nightloom tests' },
    site: { name: 'Test Meadow', latitudeDeg: 46.93, longitudeDeg: 7.62, elevationM: 870, timeZone: 'Europe/Zurich', minAltitudeDeg: 25, duskTempC: 8, dawnTempC: 3, horizon: [{ azDeg: 0, altDeg: 12 }, { azDeg: 180, altDeg: 8 }] },
    rig: defaultRigInput(),
    night: { date: '2026-10-10', darknessStart: '2026-10-10T20:31:00+02:00', darknessEnd: '2026-10-11T05:58:00+02:00' },
    targets: [
      {
        id: id.target,
        designation: 'M31',
        name: 'Andromeda Galaxy',
        type: 'galaxy',
        raDeg: 10.6847,
        decDeg: 41.2687,
        majorArcmin: 190,
        framings: [{ id: id.framing, name: 'Core', raDeg: 10.6847, decDeg: 41.2687, positionAngleDeg: 35 }],
      },
    ],
    recipe: {
      name: 'Andromeda in L',
      notes: 'Autumn test night.',
      children: [
        { kind: 'cool', id: id.cool, setpointC: -10 },
        {
          kind: 'stage',
          id: id.stage,
          targetId: id.target,
          window: { notBefore: 'astronomical-dusk', endBy: 'astronomical-dawn', minAltitudeDeg: 30 },
          rules: [{ kind: 'refocus-on-temperature', id: id.rule, deltaC: 1 }],
          children: [
            { kind: 'slew', id: '99999999-9999-4999-8999-999999999991', to: { kind: 'stage-target' } },
            { kind: 'centre', id: '99999999-9999-4999-8999-999999999992' },
            { kind: 'focus', id: id.focus, filter: 'L' },
            { kind: 'guide', id: '99999999-9999-4999-8999-999999999993' },
            { kind: 'repeat', id: id.repeat, until: { count: 2 }, children: [{ kind: 'expose', id: id.expose, filter: 'L', exposureS: 180, count: 10 }] },
          ],
        },
        { kind: 'warm', id: '99999999-9999-4999-8999-999999999994' },
        { kind: 'park', id: id.park },
      ],
    },
  } as PlanInput;
}
