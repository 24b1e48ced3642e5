import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import type { CompatibleCoil } from '../../../shared/schemas/coils';
import { uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/**
 * Property: over generated small catalogs, for any outdoor unit and air handler (or none), the coils
 * GET /api/coils/compatible returns are exactly the ones POST /api/checks (same parts, component
 * replacement, the air handler kept) finds no blocker for, and every coil left out has one.
 * Source of the expectation: the endpoint's contract itself (DESIGN.md §5); no trade values are asserted.
 */

let t: TestApp;
const auth = () => ({ Authorization: `Bearer ${t.tokenFor('estimator')}` });
type Kind = 'outdoor-units' | 'indoor-coils' | 'air-handlers' | 'rated-combinations';
const load = (kind: Kind, csv: string) => uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, dryRun: false, userId: t.users.admin.id });

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const refrigerant = fc.constantFrom('R-410A', 'R-454B', 'R-32', 'R-22');
const tons = fc.constantFrom(1.5, 2, 2.5, 3, 3.5, 4, 5);
const outdoorArb = fc.record({
  systemType: fc.constantFrom('ac', 'heat-pump'),
  refrigerant,
  tons,
  metering: fc.constantFrom('txv', 'piston', 'any', ''),
  seer2: fc.constantFrom(13.4, 14.3, 15.2, 17, ''),
});
const coilArb = fc.record({
  minTons: tons,
  spanTons: fc.constantFrom(0, 0.5, 1, 1.5),
  refrigerants: fc.uniqueArray(refrigerant, { minLength: 1, maxLength: 2 }),
  meteringType: fc.constantFrom('txv', 'piston', 'eev', 'none'),
  bidirectional: fc.constantFrom('yes', 'no', ''),
  configuration: fc.constantFrom('upflow', 'horizontal', 'multi-position', ''),
  a2lListed: fc.constantFrom('yes', 'no', ''),
  widthIn: fc.constantFrom(14, 17.5, 21, 24.5, ''),
  rated: fc.boolean(),
});
const handlerArb = fc.record({
  kind: fc.constantFrom('air-handler', 'furnace'),
  minTons: tons,
  cfm: fc.constantFrom(600, 800, 1000, 1200, 1400, 1600, 2000),
  refrigerants: fc.constantFrom('', 'R-410A', 'R-454B;R-32', 'R-410A;R-454B'),
  widthIn: fc.constantFrom(14, 17.5, 21, 24.5),
});
const catalogArb = fc.record({
  outdoors: fc.array(outdoorArb, { minLength: 1, maxLength: 2 }),
  coils: fc.array(coilArb, { minLength: 1, maxLength: 6 }),
  handlers: fc.array(handlerArb, { minLength: 0, maxLength: 2 }),
  state: fc.constantFrom('OH', 'TX', 'AZ', ''),
});

let run = 0;
const seen = { returned: 0, leftOut: 0 };

describe('GET /api/coils/compatible agrees with POST /api/checks', () => {
  it('when any generated catalog, outdoor unit and air handler are given, then no returned coil has a blocker and every left-out coil has one', async () => {
    await fc.assert(
      fc.asyncProperty(catalogArb, async (catalog) => {
        const p = `G${++run}X`;
        await load(
          'outdoor-units',
          ['model,system_type,refrigerant,nominal_tons,metering_required,seer2', ...catalog.outdoors.map((o, i) => `${p}-OD${i},${o.systemType},${o.refrigerant},${o.tons},${o.metering},${o.seer2}`)].join('\n'),
        );
        await load(
          'indoor-coils',
          [
            'model,configuration,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,a2l_listed,width_in',
            ...catalog.coils.map((c, i) => `${p}-CL${i},${c.configuration},${c.minTons},${c.minTons + c.spanTons},${c.refrigerants.join(';')},${c.meteringType},${c.meteringType === 'none' ? '' : c.refrigerants[0]},${c.bidirectional},${c.a2lListed},${c.widthIn}`),
          ].join('\n'),
        );
        if (catalog.handlers.length > 0) {
          await load('air-handlers', ['model,kind,min_tons,max_tons,airflow_cfm,refrigerants,width_in', ...catalog.handlers.map((h, i) => `${p}-AH${i},${h.kind},${h.minTons},${h.minTons + 1},${h.cfm},${h.refrigerants},${h.widthIn}`)].join('\n'));
        }
        const combos = catalog.coils.flatMap((c, i) => (c.rated ? catalog.outdoors.map((_, j) => `${p}-OD${j},${p}-CL${i},15,12,7.8,${p}-R${i}${j}`) : []));
        if (combos.length > 0) await load('rated-combinations', ['outdoor_model,indoor_model,seer2,eer2,hspf2,reference', ...combos].join('\n'));

        const ids = async (kind: string) => {
          const res = await request(t.app).get(`/api/catalog/${kind}`).query({ q: p, pageSize: 100 }).set(auth()).expect(200);
          return new Map<string, number>((res.body.items as { model: string; id: number }[]).filter((x) => x.model.startsWith(`${p}-`)).map((x) => [x.model, x.id]));
        };
        const [outdoorIds, coilIds, handlerIds] = [await ids('outdoor-units'), await ids('indoor-coils'), await ids('air-handlers')];
        expect(outdoorIds.size).toBe(catalog.outdoors.length);
        expect(coilIds.size).toBe(catalog.coils.length);

        for (const outdoorId of outdoorIds.values()) {
          for (const handlerId of [undefined, ...handlerIds.values()]) {
            const query = { outdoorUnitId: outdoorId, limit: 200, ...(handlerId ? { airHandlerId: handlerId } : {}), ...(catalog.state ? { state: catalog.state } : {}) };
            const listed = await request(t.app).get('/api/coils/compatible').query(query).set(auth()).expect(200);
            const all = await request(t.app).get('/api/coils/compatible').query({ ...query, includeIncompatible: true }).set(auth()).expect(200);
            const returned = new Set((listed.body.items as CompatibleCoil[]).map((i) => i.coil.id));
            const everyItem = new Map((all.body.items as CompatibleCoil[]).map((i) => [i.coil.id, i]));
            for (const coilId of coilIds.values()) {
              const check = await request(t.app)
                .post('/api/checks')
                .set(auth())
                .send({
                  scope: 'component-replacement',
                  ...(catalog.state ? { site: { state: catalog.state } } : {}),
                  outdoor: { id: outdoorId },
                  indoorCoil: { id: coilId },
                  ...(handlerId ? { airHandler: { id: handlerId, kept: true } } : {}),
                })
                .expect(200);
              const blocked = (check.body.findings as Finding[]).some((f) => f.severity === 'blocker');
              expect(returned.has(coilId)).toBe(!blocked);
              seen[blocked ? 'leftOut' : 'returned']++;
              const item = everyItem.get(coilId);
              expect(item).toBeDefined();
              expect(item!.verdict).toBe(check.body.verdict);
              expect(item!.findings.filter((f) => f.severity === 'blocker').map((f) => f.ruleId)).toEqual(
                (check.body.findings as Finding[]).filter((f) => f.severity === 'blocker').map((f) => f.ruleId),
              );
            }
          }
        }
      }),
      { numRuns: 25 },
    );
    // The generator must reach both sides, or the property says nothing.
    expect(seen.returned).toBeGreaterThan(0);
    expect(seen.leftOut).toBeGreaterThan(0);
  }, 180_000);
});
