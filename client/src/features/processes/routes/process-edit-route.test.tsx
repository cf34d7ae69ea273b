import { BF180G } from '@channelwright/shared/device';
import type { UpdateProcessRequest } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi, type FakeResponse } from '../../../test/fake-api';
import { admin, demoConfig } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { bf180, versionOf } from '../testing/profiles';

const PATH = '/api/processes/p-bf180';

const DERIVED = {
  cox: 8.632833e-3, gamma: 0.21105, phiF: 0.41689, twoPhiF: 0.83379, n: 1.1156, depletionWidth: 1.0381e-7, ni: 1.0e16, temperature: 27,
  equations: ['Cox = εr(SiO2)·ε0 / tox'],
  constants: [{ symbol: 'ni(300 K)', name: 'intrinsic carrier density', value: 1e16, unit: 'm⁻³', source: 'Sproul & Green 1991' }],
};

function fakeLibrary(onPut: (body: UpdateProcessRequest) => FakeResponse = (body) => ({ body: { ...bf180(), latestVersion: 2, version: { ...versionOf('p-bf180', 2), definition: body.definition, modelCard: null } } })) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: admin },
    [`GET ${PATH}`]: { body: bf180() },
    [`GET ${PATH}/versions`]: { body: [versionOf('p-bf180', 1)] },
    [`PUT ${PATH}`]: ({ body }) => onPut(body as UpdateProcessRequest),
    'POST /api/processes/derive': { body: DERIVED },
  });
}

async function openEditor() {
  const app = renderApp('/processes/p-bf180/edit', { token: 'token-admin' });
  const form = await screen.findByRole('form', { name: 'Process profile editor' });
  const nmos = within(form).getByRole('group', { name: 'NMOS' });
  return { ...app, form, nmos, kp: within(nmos).getByLabelText(/^KP \(kp\)/) };
}

// The editor renders some sixty fields; jsdom on a busy two-core machine needs more than the default 5 s for some tests.
describe('the process editor', { timeout: 60_000 }, () => {
  it('starts from the stored numbers, each in its display unit', async () => {
    fakeLibrary();
    const { nmos } = await openEditor();
    expect(within(nmos).getByLabelText(/^KP \(kp\)/)).toHaveValue('290 µA/V²');
    expect(within(nmos).getByLabelText(/^tox \(tox\)/)).toHaveValue('4.1 nm');
    expect(within(nmos).getByLabelText(/^AVT \(avt\)/)).toHaveValue('4.5 mV·µm');
    expect(within(nmos).getByLabelText(/^CJ \(cj\)/)).toHaveValue('1 fF/µm²');
  });

  it('reads SI prefixes and units as typed and shows what it read with the plausible range', async () => {
    fakeLibrary();
    const { kp, user } = await openEditor();
    await user.clear(kp);
    await user.type(kp, '0.31m');
    expect(kp).toHaveAccessibleDescription('= 310 µA/V² · plausible 10 µA/V² … 2000 µA/V²');
    await user.clear(kp);
    await user.type(kp, '310u');
    expect(kp).toHaveAccessibleDescription(/^= 310 µA\/V²/);
  });

  it('refuses a value of the wrong kind and warns about one outside the plausible range', async () => {
    fakeLibrary();
    const { kp, user } = await openEditor();
    await user.clear(kp);
    await user.type(kp, '0.3 V');
    // Mantine ties the error to the field through aria-describedby, after the reading.
    expect(kp).toHaveAccessibleDescription(/0.3 V is a voltage \(V\), but this field takes a transconductance parameter/);
    expect(kp).toHaveAttribute('aria-invalid', 'true');
    await user.clear(kp);
    await user.type(kp, '5m');
    expect(kp).toHaveAccessibleDescription(expect.stringContaining('5000 µA/V² is outside the plausible range 10 µA/V² … 2000 µA/V²'));
    expect(kp).toHaveAccessibleDescription(expect.stringContaining('= 5000 µA/V² · plausible'));
  });

  it('saves a new version from the one it edited, with the changed value in SI and everything else as it was', async () => {
    const api = fakeLibrary();
    const { kp, form, user, router } = await openEditor();
    await user.clear(kp);
    await user.type(kp, '310u');
    await user.click(within(form).getByLabelText('What changed'));
    await user.paste('kp from the new lot');
    await user.click(within(form).getByRole('button', { name: 'Save as version 2' }));

    await waitFor(() => expect(api.to(`PUT ${PATH}`)).toHaveLength(1));
    const body = api.to(`PUT ${PATH}`)[0].body as UpdateProcessRequest;
    expect(body).toMatchObject({ baseVersion: 1, message: 'kp from the new lot', nodeClass: '180 nm' });
    expect(body.definition).toEqual({ ...BF180G, nmos: { ...BF180G.nmos, kp: 310e-6 } });
    await waitFor(() => expect(router.state.location.pathname).toBe('/processes/p-bf180'));
  });

  it('does not send what the shared schema refuses, and says why beside each field', async () => {
    const api = fakeLibrary();
    const { kp, form, user } = await openEditor();
    await user.clear(kp);
    await user.type(kp, '5m');
    const vdd = within(form).getByLabelText(/^Supply VDD/);
    await user.clear(vdd);
    await user.click(within(form).getByRole('button', { name: 'Save as version 2' }));
    // The empty supply is only noticed by the schema, on saving.
    await waitFor(() => expect(vdd).toHaveAccessibleDescription(expect.stringContaining('vdd must be a number in V')));
    expect(kp).toHaveAccessibleDescription(expect.stringContaining('5000 µA/V² is outside the plausible range'));
    expect(api.to(`PUT ${PATH}`)).toHaveLength(0);
  });

  it('shows clearly that someone saved first (409) and keeps the edit on screen', async () => {
    fakeLibrary(() => errorBody(409, 'STALE_EDIT', 'Version 2 was saved by Hollis Achebe at 2026-11-20T10:00:00.000Z, after version 1 you edited; nothing was saved.', 'baseVersion'));
    const { kp, form, user } = await openEditor();
    await user.clear(kp);
    await user.type(kp, '310u');
    await user.click(within(form).getByRole('button', { name: 'Save as version 2' }));
    const alert = await within(form).findByRole('alert');
    expect(alert).toHaveTextContent('Someone saved a newer version');
    expect(alert).toHaveTextContent('Version 2 was saved by Hollis Achebe');
    expect(within(alert).getByRole('button', { name: /Start again from the latest version/ })).toBeInTheDocument();
    expect(kp).toHaveValue('310u');
  });

  it('derives γ and 2φF from tox and a doping typed in cm⁻³, sent in m⁻³, and puts them in the polarity\'s fields', async () => {
    const api = fakeLibrary();
    const { nmos, user } = await openEditor();
    await user.click(within(nmos).getByRole('button', { name: /Derive γ and 2φF/ }));
    const dialog = await screen.findByRole('dialog', { name: /Derive NMOS parameters/ });
    await user.type(within(dialog).getByLabelText('Oxide thickness tox'), '4n');
    await user.type(within(dialog).getByLabelText(/^Body doping/), '1e17 cm^-3');
    await user.click(within(dialog).getByRole('button', { name: 'Derive' }));
    await within(dialog).findByRole('table', { name: 'Derived parameters' });
    expect(api.to('POST /api/processes/derive')[0].body).toEqual({ tox: 4e-9, substrateDoping: 1e23, temperature: 27 });
    expect(within(dialog).getByText('Sproul & Green 1991')).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Use tox, γ, 2φF for NMOS' }));
    await waitFor(() => expect(within(nmos).getByLabelText(/^γ \(gamma\)/)).toHaveValue('0.21105 √V'));
    expect(within(nmos).getByLabelText(/^2φF \(twoPhiF\)/)).toHaveValue('0.83379 V');
    expect(within(nmos).getByLabelText(/^tox \(tox\)/)).toHaveValue('4 nm');
  });
});
