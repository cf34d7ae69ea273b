import { BF180G } from '@channelwright/shared/device';
import { parseQuantity } from '@channelwright/shared/units';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { workbenchHandlers } from '../../../test/fake-compute-api';

/** The form's tests leave the charts computing (their sweeps never answer), so only the form and results draw. */
const chartsStayPending = { 'POST /api/compute/sweep': () => new Promise<never>(() => {}) };

function fakeServer(overrides: Parameters<typeof installFakeApi>[0] = {}) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    ...workbenchHandlers,
    ...chartsStayPending,
    ...overrides,
  });
}

async function openWorkbench() {
  const app = renderApp('/workbench', { token: 'token-ines' });
  await screen.findByRole('group', { name: 'Sizing targets' }, { timeout: 10_000 });
  return app;
}

/** Puts text into a field at once (a paste), as the tests that are not about typing need. */
async function fill(user: ReturnType<typeof renderApp>['user'], name: string, text: string) {
  const field = screen.getByRole('textbox', { name });
  await user.clear(field);
  await user.click(field);
  await user.paste(text);
}

const lastSizeRequest = (api: ReturnType<typeof fakeServer>) => api.to('POST /api/compute/size').at(-1)?.body as Record<string, unknown> | undefined;

/** The value cell of a row in one of the result groups, e.g. ("Geometry", "W"). */
function resultCell(group: string, symbol: string): HTMLElement {
  const table = screen.getByRole('table', { name: group });
  const row = within(table).getByRole('rowheader', { name: symbol }).closest('tr') as HTMLElement;
  return within(row).getAllByRole('cell').at(-1) as HTMLElement;
}

/** The number a result cell shows, read back in SI ("1.608 µm" → 1.608e-6). */
function shownQuantity(group: string, symbol: string, unit: string): number {
  const text = resultCell(group, symbol).textContent ?? '';
  const parsed = parseQuantity(text, unit);
  if (!parsed.ok) throw new Error(`"${text}" is not a quantity in ${unit}: ${parsed.reason}`);
  return parsed.value;
}

describe('the device form', { timeout: 20_000 }, () => {
  it('reads SI prefixes and shows each parsed value with its unit', async () => {
    fakeServer();
    const { user } = await openWorkbench();

    await user.type(screen.getByRole('textbox', { name: 'ID' }), '20u');
    await user.type(screen.getByRole('textbox', { name: 'L' }), '0.5 µm');

    expect(screen.getByText('= 20 µA')).toBeInTheDocument();
    expect(screen.getByText('= 500 nm')).toBeInTheDocument();
  });

  it('sends the targets in SI units and shows the sized device', async () => {
    const api = fakeServer();
    const { user } = await openWorkbench();

    await user.click(screen.getByRole('radio', { name: 'Square law' }));
    await fill(user, 'ID', '20u');
    await fill(user, 'L', '0.5um');
    await fill(user, 'VOV', '200m');

    await waitFor(() => expect(lastSizeRequest(api)).toMatchObject({ id: 20e-6, l: 0.5e-6, vov: 0.2, vds: 0.9, vsb: 0, model: 'square-law', processId: 'p-bf180g', processVersion: 2 }));
    // Shichman and Hodges (1968), saturation: W = 2·ID·L / (kp·VOV²·(1 + λ·VDS)), with BF180-G's
    // invented kp = 290 µA/V² and λ = 0.08 /V at L = lRef = 0.5 µm (λ scales as lRef/L):
    // 2·20e-6·0.5e-6 / (290e-6·0.04·1.072) = 1.608 µm, which the 5 nm grid rounds to 1.61 µm.
    const { kp, lambda, wgrid } = BF180G.nmos;
    const lRef = BF180G.nmos.lRef as number;
    const byHand = (2 * 20e-6 * 0.5e-6) / (kp * 0.2 ** 2 * (1 + ((lambda * lRef) / 0.5e-6) * 0.9));
    await waitFor(() => expect(resultCell('Geometry', 'W')).toHaveTextContent('1.61 µm'));
    // The width the engine found before the grid is the hand value to the four digits shown, and the
    // drawn width is the multiple of the grid nearest to it.
    expect(shownQuantity('Geometry', 'W (exact)', 'm') / byHand).toBeCloseTo(1, 3);
    expect(Math.abs(shownQuantity('Geometry', 'W', 'm') - byHand)).toBeLessThanOrEqual(wgrid / 2);
    expect(resultCell('Geometry', 'L')).toHaveTextContent('500 nm');
    // The snapped W is a little wider than needed, so the VOV reached is a hair under the target.
    const reached = parseQuantity(resultCell('Bias', 'VOV').textContent ?? '', 'V');
    expect(reached.ok && reached.value).toBeCloseTo(0.2, 3);
    expect(screen.getByRole('status', { name: 'Warnings' })).toHaveTextContent('No warnings');
  });

  it('lists every caution of the operating point in plain words', async () => {
    fakeServer();
    const { user } = await openWorkbench();

    await fill(user, 'ID', '20u');
    await fill(user, 'L', '0.25u');
    await fill(user, 'VDS', '0.1');
    await fill(user, 'VOV', '0.2');

    const warnings = await screen.findByRole('list', { name: 'Warnings' });
    expect(within(warnings).getByText('L is close to the minimum: short-channel effects are not modelled')).toBeInTheDocument();
    expect(within(warnings).getByText('VDS is below VDSsat: the device is not saturated')).toBeInTheDocument();
    expect(resultCell('Bias', 'Saturated')).toHaveTextContent('no');
  });

  it('keeps the other constraints when switching between VOV, gm/ID, W and VGS, and sends only the chosen one', async () => {
    const api = fakeServer();
    const { user } = await openWorkbench();
    await fill(user, 'ID', '10u');
    await fill(user, 'L', '1u');
    await fill(user, 'VOV', '0.15');

    await user.click(screen.getByRole('radio', { name: 'gm/ID' }));
    expect(screen.queryByRole('textbox', { name: 'VOV' })).not.toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveValue('');
    await fill(user, 'gm/ID', '12');
    await waitFor(() => expect(lastSizeRequest(api)).toMatchObject({ gmId: 12 }));
    expect(lastSizeRequest(api)).not.toHaveProperty('vov');

    await user.click(screen.getByRole('radio', { name: 'VOV' }));
    expect(screen.getByRole('textbox', { name: 'VOV' })).toHaveValue('0.15');
    expect(screen.getByRole('textbox', { name: 'ID' })).toHaveValue('10u');
    expect(screen.getByRole('textbox', { name: 'L' })).toHaveValue('1u');
    await waitFor(() => expect(lastSizeRequest(api)).toMatchObject({ vov: 0.15 }));
    expect(lastSizeRequest(api)).not.toHaveProperty('gmId');

    await user.click(screen.getByRole('radio', { name: 'gm/ID' }));
    expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveValue('12');
  });

  it('refuses a quantity of the wrong kind beside its field, without asking the server', async () => {
    const api = fakeServer();
    const { user } = await openWorkbench();
    await fill(user, 'L', '0.5u');
    await fill(user, 'VOV', '0.2');
    await fill(user, 'ID', '20 µV');

    expect(screen.getByRole('textbox', { name: 'ID' })).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('textbox', { name: 'ID' })).toHaveAccessibleDescription(/is a voltage \(V\), but this field takes a current \(A\)/);
    expect(api.to('POST /api/compute/size')).toHaveLength(0);
  });

  it("shows the server's refusal of a field beside that field", async () => {
    const refusal = 'gm/ID = 40 /V is above the weak-inversion limit 1/(n·UT) = 31.2 /V at 27 °C';
    fakeServer({ 'POST /api/compute/size': errorBody(400, 'GM_ID_ABOVE_WEAK_INVERSION_LIMIT', refusal, 'gmId') });
    const { user } = await openWorkbench();
    await fill(user, 'ID', '1u');
    await fill(user, 'L', '1u');
    await user.click(screen.getByRole('radio', { name: 'gm/ID' }));
    await fill(user, 'gm/ID', '40');

    await waitFor(() => expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveAttribute('aria-invalid', 'true'));
    expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveAccessibleDescription(refusal);
    expect(screen.getByRole('textbox', { name: 'ID' })).not.toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('alert')).toHaveTextContent('see the highlighted field');
  });

  it('names PMOS voltages polarity-normalised', async () => {
    fakeServer();
    const { user } = await openWorkbench();
    expect(screen.getByRole('textbox', { name: 'VDS' })).toBeInTheDocument();

    await user.click(screen.getByRole('radio', { name: 'PMOS' }));

    expect(screen.getByRole('textbox', { name: 'VSD' })).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'VBS' })).toBeInTheDocument();
    expect(screen.queryByRole('textbox', { name: 'VDS' })).not.toBeInTheDocument();
    expect(screen.getByRole('note', { name: 'Polarity convention' })).toHaveTextContent('polarity-normalised: enter VSG, VSD and VBS');
  });

  it('starts from a link: the linked process version, PMOS, its bias, L and gm/ID as the constraint', async () => {
    const api = fakeServer();
    const { user } = renderApp('/workbench?processId=p-bf180g&version=1&polarity=pmos&corner=SS&temperature=125&l=0.000001&gmId=12&vds=0.6&vsb=0.2', { token: 'token-ines' });
    await screen.findByRole('group', { name: 'Sizing targets' }, { timeout: 10_000 });
    expect(screen.getByRole('combobox', { name: 'Process' })).toHaveValue('BF180-G · v1');
    expect(screen.getByRole('textbox', { name: 'L' })).toHaveValue('1 µm');
    expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveValue('12');
    expect(screen.getByRole('textbox', { name: 'VSD' })).toHaveValue('600 mV');
    expect(screen.getByRole('textbox', { name: 'VBS' })).toHaveValue('200 mV');
    await user.click(screen.getByRole('textbox', { name: 'ID' }));
    await user.paste('10u');
    await waitFor(() =>
      expect(lastSizeRequest(api)).toMatchObject({ processId: 'p-bf180g', processVersion: 1, polarity: 'pmos', corner: 'SS', temperature: 125, l: 1e-6, gmId: 12, vds: 0.6, vsb: 0.2, id: 10e-6 }),
    );
  });
});
