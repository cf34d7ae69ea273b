import type { Device, Project } from '@channelwright/shared/schemas';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { workbenchHandlers } from '../../../test/fake-compute-api';
import { storedDevice, storedSheet, wrenmoss } from '../../../test/fake-sheets';

const µ = 1e-6;
const m1 = storedDevice('d-m1', 0, { name: 'M1', function: 'input pair (+)', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, vds: 0.6, gmId: 16 });

interface Options {
  role?: Project['myRole'];
  /** What PATCH answers; the stored device otherwise. */
  patch?: () => ReturnType<typeof errorBody> | { body: Device };
  /** The device as the next GET of the sheet reads it. */
  storedAfter?: Device;
}

function fakeServer({ role = 'designer', patch, storedAfter }: Options = {}) {
  let reads = 0;
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    ...workbenchHandlers,
    // The form's tests leave the charts computing.
    'POST /api/compute/sweep': () => new Promise<never>(() => {}),
    [`GET /api/projects/${wrenmoss.id}`]: { body: { ...wrenmoss, myRole: role } },
    'GET /api/sheets/s-amp': () => ({ body: storedSheet([reads++ > 0 && storedAfter ? storedAfter : m1]) }),
    'PATCH /api/sheets/s-amp/devices/d-m1': ({ body }) => patch?.() ?? { body: { ...m1, version: (body as { version: number }).version + 1 } },
    'POST /api/sheets/s-amp/devices': ({ body }) => ({ status: 201, body: storedDevice('d-new', 1, body as never) }),
  });
}

const field = (name: string) => screen.getByRole('textbox', { name });

async function openDevice(path = '/sheets/s-amp/devices/d-m1') {
  const app = renderApp(path, { token: 'token-ines' });
  await screen.findByRole('group', { name: 'Sizing targets' }, { timeout: 10_000 });
  return app;
}

async function retype(user: Awaited<ReturnType<typeof openDevice>>['user'], name: string, text: string) {
  await user.clear(field(name));
  await user.click(field(name));
  await user.paste(text);
}

describe('the device page of a stored device', { timeout: 20_000 }, () => {
  it('loads the stored targets into the form, in engineering notation, with the stored constraint chosen', async () => {
    fakeServer();
    await openDevice();

    expect(field('Name')).toHaveValue('M1');
    expect(field('ID')).toHaveValue('10 µA');
    expect(field('L')).toHaveValue('500 nm');
    expect(field('VSD')).toHaveValue('600 mV');
    expect(screen.getByRole('radio', { name: 'gm/ID' })).toBeChecked();
    expect(field('gm/ID')).toHaveValue('16');
    expect(await screen.findByRole('table', { name: 'Geometry' })).toBeInTheDocument();
  });

  it('saves only what changed, with the version edited', async () => {
    const api = fakeServer();
    const { user } = await openDevice();

    await retype(user, 'L', '1u');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(api.to('PATCH /api/sheets/s-amp/devices/d-m1')).toHaveLength(1));
    expect(api.to('PATCH /api/sheets/s-amp/devices/d-m1')[0].body).toEqual({ version: 1, l: 1e-6 });
    expect(await screen.findByText('Saved as version 2')).toBeInTheDocument();
  });

  it('shows a stale edit clearly, keeps the input, and can save it over the newer version', async () => {
    let conflicts = 1;
    const api = fakeServer({
      storedAfter: { ...m1, version: 3 },
      patch: () => (conflicts-- > 0 ? errorBody(409, 'STALE_EDIT', 'This device was changed by someone else (version 3)') : { body: { ...m1, version: 4, targets: { ...m1.targets, l: 1e-6 } } }),
    });
    const { user } = await openDevice();

    await retype(user, 'L', '1u');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText('Someone changed this device since you opened it')).toBeInTheDocument();
    expect(field('L')).toHaveValue('1u');
    await user.click(screen.getByRole('button', { name: 'Save mine over it' }));

    await waitFor(() => expect(api.to('PATCH /api/sheets/s-amp/devices/d-m1')).toHaveLength(2));
    expect(api.to('PATCH /api/sheets/s-amp/devices/d-m1')[1].body).toEqual({ version: 3, l: 1e-6 });
    await waitFor(() => expect(screen.queryByText('Someone changed this device since you opened it')).not.toBeInTheDocument());
    expect(await screen.findByText('Saved as version 4')).toBeInTheDocument();
  });

  it("shows the server's refusal of a field beside it", async () => {
    fakeServer({ patch: () => errorBody(400, 'VALIDATION_FAILED', 'L = 100 nm is below the process minimum 180 nm', 'l') });
    const { user } = await openDevice();

    await retype(user, 'L', '100n');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(field('L')).toHaveAccessibleDescription('L = 100 nm is below the process minimum 180 nm'));
    expect(field('L')).toHaveValue('100n');
  });

  it('says a taken name is taken, beside the name, and does not call it an edit conflict', async () => {
    fakeServer({ patch: () => errorBody(409, 'DEVICE_NAME_TAKEN', 'This sheet already has a device named M2', 'name') });
    const { user } = await openDevice();

    await retype(user, 'Name', 'M2');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(field('Name')).toHaveAccessibleDescription('Name taken: This sheet already has a device named M2'));
    expect(field('Name')).toHaveValue('M2');
    expect(screen.queryByText('Someone changed this device since you opened it')).not.toBeInTheDocument();
  });

  it('lets a viewer read the device but not change or save it', async () => {
    fakeServer({ role: 'viewer' });
    await openDevice();

    await screen.findByText('read only');
    expect(field('ID')).toBeDisabled();
    expect(field('Name')).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save' })).not.toBeInTheDocument();
  });

  it('adds a new device under the next free name and opens it', async () => {
    const api = fakeServer();
    const { user, router } = await openDevice('/sheets/s-amp/devices/new');

    expect(field('Name')).toHaveValue('M2');
    await retype(user, 'ID', '20u');
    await retype(user, 'L', '0.5 µm');
    await user.click(screen.getByRole('radio', { name: 'VOV' }));
    await retype(user, 'VOV', '0.2');
    await user.click(screen.getByRole('button', { name: 'Save to the sheet' }));

    await waitFor(() => expect(api.to('POST /api/sheets/s-amp/devices')).toHaveLength(1));
    const body = api.to('POST /api/sheets/s-amp/devices')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ name: 'M2', polarity: 'nmos', id: 20e-6, l: 0.5e-6, vds: 0.9, vsb: 0, vov: 0.2, model: 'all-region', multiplier: 1 });
    // Corner and temperature left empty follow the sheet.
    expect(body).not.toHaveProperty('corner');
    expect(body).not.toHaveProperty('temperature');
    await waitFor(() => expect(router.state.location.pathname).toBe('/sheets/s-amp/devices/d-new'));
  });
});
