import { characterisationJobListSchema, sheetSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// The demo at first start: its processes characterised in the background, its sheets on the table model waiting for
// the tables. The tests start the characterisation only to look at it (it takes minutes), then stop the server.

async function demo(t: TestApp) {
  const admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
  const designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
  const processes = (await t.http().get('/api/processes').set(bearer(admin)).expect(200)).body as { id: string; name: string }[];
  const jobsOf = async (name: string) => {
    const id = processes.find((p) => p.name === name)?.id;
    return characterisationJobListSchema.parse((await t.http().get(`/api/processes/${id}/characterisations`).set(bearer(designer)).expect(200)).body);
  };
  const projectId = (await t.http().get('/api/projects').set(bearer(designer)).expect(200)).body[0].id;
  const sheets = (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(designer)).expect(200)).body as { id: string }[];
  const firstSheet = sheetSchema.parse((await t.http().get(`/api/sheets/${sheets[0].id}`).set(bearer(designer)).expect(200)).body);
  return { jobsOf, sheets, firstSheet };
}

describe('the demo at first start', () => {
  it('characterises the demo processes in the background over the default grid, progress visible, and puts the demo sheets on the table model, their devices waiting for the tables', async () => {
    const t = await createTestApp({ env: { DEMO_CHARACTERISATION: 'true' } });
    try {
      const { jobsOf, firstSheet } = await demo(t);
      const [bf180] = await jobsOf('BF180-G');
      const [bf130] = await jobsOf('BF130-G');
      expect(bf180).toMatchObject({ progress: { total: 1_086_000 * 2 + 1_338_000 }, requestedBy: { displayName: expect.any(String) } });
      expect(['queued', 'running']).toContain(bf180.status);
      expect(bf180.devices.map((d) => d.model)).toEqual(['bfn18', 'bfp18', 'bfn18na']);
      expect(bf130.devices.map((d) => d.model)).toEqual(['bfn13', 'bfp13']);
      expect(firstSheet.model).toBe('table');
      for (const device of firstSheet.devices) {
        expect(device.result).toBeNull();
        expect(device.error).toMatchObject({ code: 'TABLE_NOT_READY', message: expect.stringMatching(/characterisation is (queued|running)/) });
      }
    } finally {
      await t.close();
    }
  });

  it('characterises nothing in a test server unless the test asks, and keeps the demo sheets on the all-region model', async () => {
    const t = await createTestApp();
    try {
      const { jobsOf, firstSheet } = await demo(t);
      expect(await jobsOf('BF180-G')).toEqual([]);
      expect(firstSheet.model).toBe('all-region');
      expect(firstSheet.devices.every((d) => d.result !== null)).toBe(true);
    } finally {
      await t.close();
    }
  });
});
