import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, type FakeResponse } from '../../../test/fake-api';
import { BF180G_WITH_CARD, jobOf, NMOS_TABLE } from '../../../test/fake-characterisation';
import { admin, demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

const ID = BF180G_WITH_CARD.id;

function fakeProcess(me: typeof admin, handlers: Record<string, FakeResponse | (() => FakeResponse)>) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: me },
    [`GET /api/processes/${ID}`]: { body: BF180G_WITH_CARD },
    [`GET /api/processes/${ID}/versions`]: { body: [] },
    [`GET /api/processes/${ID}/tables`]: { body: [] },
    ...handlers,
  });
}

const panel = () => screen.findByRole('region', { name: 'Characterisation' }, { timeout: 10_000 });

describe('the characterisation of a process version', { timeout: 20_000 }, () => {
  it('shows a running job as a progress bar with points done of all and the time to go, read again until it is done', async () => {
    let reads = 0;
    const api = fakeProcess(designer, {
      [`GET /api/processes/${ID}/characterisations`]: () => {
        reads += 1;
        return { body: [reads === 1 ? jobOf({ progress: { done: 543_000, total: 2_172_000 }, etaSeconds: 42 }) : jobOf({ status: 'done', progress: { done: 2_172_000, total: 2_172_000 } })] };
      },
    });
    renderApp(`/processes/${ID}`, { token: 'token-designer' });
    const region = await panel();
    expect(await within(region).findByLabelText('Points simulated')).toHaveTextContent('543,000 of 2,172,000 points (25 %)');
    expect(within(region).getByLabelText('Time to go')).toHaveTextContent('about 42 s to go');
    expect(within(region).getByRole('progressbar', { name: 'Characterisation progress' })).toHaveAttribute('aria-valuenow', '25');
    await waitFor(() => expect(within(region).getByLabelText('Characterisation status')).toHaveTextContent('done'), { timeout: 6000 });
    expect(within(region).getByLabelText('Points simulated')).toHaveTextContent('2,172,000 of 2,172,000 points (100 %)');
    // The tables are read again once the job is done.
    await waitFor(() => expect(api.to(`GET /api/processes/${ID}/tables`).length).toBeGreaterThan(1));
  });

  it('offers designers neither starting nor cancelling, but lists the tables and links the design charts', async () => {
    fakeProcess(designer, {
      [`GET /api/processes/${ID}/characterisations`]: { body: [jobOf({ status: 'done', progress: { done: 10, total: 10 } })] },
      [`GET /api/processes/${ID}/tables`]: { body: [NMOS_TABLE] },
    });
    renderApp(`/processes/${ID}`, { token: 'token-designer' });
    const region = await panel();
    const tables = await within(region).findByRole('table', { name: 'Characterised tables' });
    const row = within(tables).getAllByRole('row')[1];
    const cells = within(row).getAllByRole('cell').map((c) => c.textContent);
    expect(cells[0]).toBe('NMOSbfn18');
    expect(cells[1]).toBe('180 nm, 207 nm, 239 nm, 288 nm, 360 nm, 540 nm, 900 nm, 1.44 µm, 2.16 µm, 3.6 µm');
    expect(cells[5]).toBe('TT, FF, SS, FS, SF');
    expect(cells[7]).toBe('1,086,000');
    expect(cells[8]).toBe('in use');
    expect(within(region).getByRole('link', { name: 'Open the gm/ID design charts' })).toHaveAttribute('href', `/processes/${ID}/design-charts?version=2`);
    expect(within(region).queryByRole('button', { name: 'Characterise…' })).not.toBeInTheDocument();
    expect(within(region).queryByRole('button', { name: 'Cancel' })).not.toBeInTheDocument();
  });

  it('shows a maintainer the default grid before starting, and starts it for the version shown', async () => {
    const api = fakeProcess(admin, {
      [`GET /api/processes/${ID}/characterisations`]: { body: [] },
      'POST /api/characterisations': { status: 202, body: jobOf({ status: 'queued' }) },
    });
    const { user } = renderApp(`/processes/${ID}`, { token: 'token-admin' });
    const region = await panel();
    await user.click(await within(region).findByRole('button', { name: 'Characterise…' }));
    const grid = within(region).getByRole('table', { name: 'Default grid' });
    // docs/characterisation.md, section 3: 10 lengths × 181 VGS × 8 VDS × 5 VSB × 5 corners × 3 temperatures per device.
    expect(within(grid).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').at(-1)?.textContent)).toEqual(['1,086,000', '1,086,000']);
    await user.click(within(region).getByRole('button', { name: 'Start with the default grid (2,172,000 points)' }));
    await waitFor(() => expect(api.to('POST /api/characterisations')).toHaveLength(1));
    expect(api.to('POST /api/characterisations')[0].body).toEqual({ processId: ID, version: 2 });
  });

  it('lets a maintainer cancel a running job', async () => {
    const api = fakeProcess(admin, {
      [`GET /api/processes/${ID}/characterisations`]: { body: [jobOf({ status: 'queued', engine: null })] },
      'DELETE /api/characterisations/job-1': { body: jobOf({ status: 'cancelled' }) },
    });
    const { user } = renderApp(`/processes/${ID}`, { token: 'token-admin' });
    const region = await panel();
    expect(await within(region).findByLabelText('Time to go')).toHaveTextContent('waiting for a free simulator');
    await user.click(within(region).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(api.to('DELETE /api/characterisations/job-1')).toHaveLength(1));
  });

  it("shows why a job failed, with the simulator's own message", async () => {
    fakeProcess(designer, {
      [`GET /api/processes/${ID}/characterisations`]: {
        body: [jobOf({ status: 'failed', progress: { done: 1200, total: 2_172_000 }, error: { code: 'SIMULATION_FAILED', message: 'ngspice stopped: BSIM4: mosfet m1, model bfn18: Effective channel length <= 0' } })],
      },
    });
    renderApp(`/processes/${ID}`, { token: 'token-designer' });
    const region = await panel();
    expect(await within(region).findByText('The characterisation failed; nothing of it was kept')).toBeInTheDocument();
    expect(within(region).getByText(/Effective channel length <= 0/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Cancel' })).not.toBeInTheDocument();
  });
});
