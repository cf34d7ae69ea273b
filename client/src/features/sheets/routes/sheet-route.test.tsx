import type { Device, Project } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { storedDevice, storedSheet, wrenmoss } from '../../../test/fake-sheets';

const µ = 1e-6;
const input = storedDevice('d-m1', 0, { name: 'M1', function: 'input pair (+)', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, vds: 0.6, gmId: 16 });
// L below 2·lmin and VDS below VDSsat: two warnings.
const second = storedDevice('d-m6', 1, { name: 'M6', function: 'second stage', polarity: 'nmos', id: 200 * µ, l: 0.25 * µ, vds: 0.1, vov: 0.3 });
// gm/ID above 1/(n·UT): the engine refuses, the device is stored without a result.
const refused = storedDevice('d-mx', 2, { name: 'MX', function: 'too ambitious', polarity: 'nmos', id: 1 * µ, l: 1 * µ, vds: 0.9, gmId: 40 });
const trickle = storedDevice('d-m9', 3, { name: 'M9', function: 'trickle bias leg', polarity: 'nmos', id: 0.1 * µ, l: 2 * µ, vds: 0.9, vov: -0.1 });

function fakeServer({ devices = [input, second, refused, trickle], role = 'designer' as Project['myRole'] } = {}) {
  const sheet = storedSheet(devices);
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    [`GET /api/projects/${wrenmoss.id}`]: { body: { ...wrenmoss, myRole: role } },
    'GET /api/sheets/s-amp': { body: sheet },
    'POST /api/sheets/s-amp/recompute': { body: { ...sheet, stale: false, staleCount: 0, devices: sheet.devices.map((d) => ({ ...d, stale: false, staleReasons: [] })) } },
    'GET /api/sheets/s-amp/export': { body: 'csv' },
    'POST /api/sheets/s-amp/devices': ({ body }) => ({ status: 201, body: storedDevice('d-copy', 9, body as never) }),
    'DELETE /api/sheets/s-amp/devices/d-m6': { status: 204 },
  });
}

async function openSheet() {
  const app = renderApp('/sheets/s-amp', { token: 'token-ines' });
  const table = await screen.findByRole('table', { name: 'Devices' }, { timeout: 10_000 });
  return { ...app, table };
}

const namesInOrder = (table: HTMLElement) =>
  within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => row.getAttribute('data-device'));

function cellOf(table: HTMLElement, device: string, column: string): HTMLElement {
  const headers = within(table).getAllByRole('columnheader').map((th) => th.textContent?.trim());
  const row = within(table).getAllByRole('row').find((r) => r.getAttribute('data-device') === device) as HTMLElement;
  return within(row).getAllByRole('cell')[headers.indexOf(column)];
}

const resultOf = (device: Device) => device.result as NonNullable<Device['result']>;

describe('the sheet page', { timeout: 20_000 }, () => {
  it('lists every device with its figures in engineering notation, right-aligned with their units', async () => {
    fakeServer();
    const { table } = await openSheet();

    expect(namesInOrder(table)).toEqual(['M1', 'M6', 'MX', 'M9']);
    expect(cellOf(table, 'M1', 'W')).toHaveTextContent(formatQuantity(resultOf(input).w, 'm'));
    expect(cellOf(table, 'M1', 'W')).toHaveTextContent(/^\d+(\.\d+)? µm$/);
    expect(cellOf(table, 'M1', 'W')).toHaveStyle({ textAlign: 'right' });
    expect(cellOf(table, 'M1', 'ID')).toHaveTextContent('10 µA');
    expect(cellOf(table, 'M9', 'ID')).toHaveTextContent('100 nA');
    expect(cellOf(table, 'M1', 'gm')).toHaveTextContent(formatQuantity(resultOf(input).gm, 'S'));
    expect(cellOf(table, 'M6', 'fT')).toHaveTextContent(/ GHz$/);
    expect(cellOf(table, 'M1', 'Type')).toHaveTextContent('PMOS');
    expect(cellOf(table, 'M9', 'Region')).toHaveTextContent('weak');
    expect(cellOf(table, 'MX', 'W')).toHaveTextContent('—');
  });

  it('sorts by a column both ways, keeping devices without a value last', async () => {
    fakeServer();
    const { table, user } = await openSheet();
    const header = (name: string) => within(table).getByRole('button', { name });

    await user.click(header('ID'));
    expect(namesInOrder(table)).toEqual(['M9', 'MX', 'M1', 'M6']);
    expect(header('ID').closest('th')).toHaveAttribute('aria-sort', 'ascending');

    await user.click(header('ID'));
    expect(namesInOrder(table)).toEqual(['M6', 'M1', 'MX', 'M9']);
    expect(header('ID').closest('th')).toHaveAttribute('aria-sort', 'descending');

    await user.click(header('W'));
    const widths = [input, second, trickle].sort((a, b) => resultOf(a).w - resultOf(b).w).map((d) => d.targets.name);
    expect(namesInOrder(table)).toEqual([...widths, 'MX']);
    await user.click(header('W'));
    expect(namesInOrder(table)).toEqual([...widths.reverse(), 'MX']);

    await user.click(header('W'));
    expect(namesInOrder(table)).toEqual(['M1', 'M6', 'MX', 'M9']);
    expect(header('W').closest('th')).toHaveAttribute('aria-sort', 'none');
  });

  it('counts the warnings of each device, names them, and marks a device the engine could not size', async () => {
    fakeServer();
    const { table } = await openSheet();

    expect(resultOf(second).warnings.map((w) => w.code).sort()).toEqual(['L_NEAR_LMIN', 'VDS_BELOW_VDSSAT']);
    const badge = within(cellOf(table, 'M6', 'Warnings')).getByLabelText(/^2 warnings: /);
    expect(badge).toHaveTextContent('2 warnings');
    expect(badge).toHaveAccessibleName(/L is close to the minimum: short-channel effects are not modelled/);
    expect(badge).toHaveAccessibleName(/VDS is below VDSsat: the device is not saturated/);
    expect(within(cellOf(table, 'M1', 'Warnings')).getByLabelText('No warnings')).toBeInTheDocument();
    expect(refused.error?.code).toBe('GM_ID_ABOVE_WEAK_INVERSION_LIMIT');
    expect(within(cellOf(table, 'MX', 'Warnings')).getByText('not sized')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Totals' })).toHaveTextContent('Not sized: MX');
  });

  it('gives designers the add, duplicate and delete actions', async () => {
    const api = fakeServer();
    const { user } = await openSheet();
    expect(await screen.findByRole('link', { name: 'Add device' })).toHaveAttribute('href', '/sheets/s-amp/devices/new');

    await user.click(screen.getByRole('button', { name: 'Actions for M1' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Duplicate M1' }));
    await waitFor(() => expect(api.to('POST /api/sheets/s-amp/devices')).toHaveLength(1));
    expect(api.to('POST /api/sheets/s-amp/devices')[0].body).toMatchObject({ name: 'M1 copy', polarity: 'pmos', id: 10 * µ, l: 0.5 * µ, gmId: 16 });

    await user.click(screen.getByRole('button', { name: 'Actions for M6' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Delete M6' }));
    await user.click(await screen.findByRole('button', { name: 'Delete' }));
    await waitFor(() => expect(api.requests.filter((r) => r.method === 'DELETE').map((r) => r.path)).toEqual(['/api/sheets/s-amp/devices/d-m6']));
  });

  it('hides every edit action from a viewer', async () => {
    fakeServer({ role: 'viewer' });
    await openSheet();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Download CSV' })).toBeInTheDocument());
    // The role arrives with the project; wait for it before asserting what is absent.
    await screen.findByRole('link', { name: wrenmoss.name });
    expect(screen.queryByRole('link', { name: 'Add device' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Actions for M1' })).not.toBeInTheDocument();
  });

  it('says when results are stale and lets a designer recompute the sheet', async () => {
    const api = fakeServer({ devices: [{ ...input, stale: true, staleReasons: ['process'], computedWith: { ...input.computedWith, processVersionId: 'v-bf180g-1', processVersion: 1 } }, second] });
    const { user } = await openSheet();

    const banner = (await screen.findByText('Some results are out of date')).closest('[role="alert"]') as HTMLElement;
    expect(banner).toHaveTextContent('1 of 2 devices were computed with BF180-G v1 (the sheet is now on BF180-G v2)');
    expect(banner).toHaveTextContent('would give now: M1.');
    await user.click(within(banner).getByRole('button', { name: 'Recompute the sheet' }));

    await waitFor(() => expect(api.to('POST /api/sheets/s-amp/recompute')).toHaveLength(1));
    await waitFor(() => expect(screen.queryByText('Some results are out of date')).not.toBeInTheDocument());
  });

  it('downloads the CSV export with the session token', async () => {
    const api = fakeServer();
    const created: Blob[] = [];
    vi.stubGlobal('URL', Object.assign(URL, { createObjectURL: (blob: Blob) => (created.push(blob), 'blob:sheet'), revokeObjectURL: () => {} }));
    const { user } = await openSheet();

    await user.click(screen.getByRole('button', { name: 'Download CSV' }));

    await waitFor(() => expect(api.to('GET /api/sheets/s-amp/export')).toHaveLength(1));
    expect(api.to('GET /api/sheets/s-amp/export')[0].headers.get('Authorization')).toBe('Bearer token-ines');
    await waitFor(() => expect(created).toHaveLength(1));
    expect(created[0].type).toBe('text/csv;charset=utf-8');
  });
});
