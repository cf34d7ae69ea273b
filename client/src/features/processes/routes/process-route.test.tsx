import { BF180G } from '@channelwright/shared/device';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { admin, demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { profileOf, versionOf } from '../testing/profiles';

const v2 = () => profileOf('p-bf180', { ...structuredClone(BF180G), nmos: { ...BF180G.nmos, kp: 310e-6 } }, { version: 2 });

function fakeProfile(me = designer, profile = v2()) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: me },
    'GET /api/processes/p-bf180': { body: profile },
    'GET /api/processes/p-bf180/versions': { body: [versionOf('p-bf180', 2, 'kp from the new lot'), versionOf('p-bf180', 1)] },
    'GET /api/processes/p-bf180/diff': {
      body: { profileId: 'p-bf180', from: 1, to: 2, changes: [{ path: 'nmos.kp', group: 'nmos', kind: 'changed', unit: 'A/V²', from: 290e-6, to: 310e-6 }] },
    },
  });
}

describe('the process profile page', { timeout: 15_000 }, () => {
  it('shows the parameters per polarity in engineering notation, the corners and the demo-data caution', async () => {
    fakeProfile();
    renderApp('/processes/p-bf180', { token: 'token-designer' });
    const parameters = await screen.findByRole('table', { name: 'Device parameters' }, { timeout: 10_000 });
    const kp = within(parameters).getByRole('row', { name: /KP/ });
    expect(within(kp).getAllByRole('cell').map((c) => c.textContent)).toEqual(['310 µA/V²', '65 µA/V²']);
    const tox = within(parameters).getByRole('row', { name: /tox/ });
    expect(within(tox).getAllByRole('cell').map((c) => c.textContent)).toEqual(['4.1 nm', '4.1 nm']);
    const ff = within(screen.getByRole('table', { name: 'Corners' })).getByRole('row', { name: /FF/ });
    expect(within(ff).getAllByRole('cell').map((c) => c.textContent)).toEqual(['-40 mV', '1.1', '-40 mV', '1.1']);
    expect(screen.getAllByText("Invented demo data, not any foundry's process").length).toBeGreaterThan(0);
    expect(screen.getByText(/not a foundry's process or device model/)).toBeInTheDocument();
    expect(screen.queryByText('Written before engine 2.0: check kp')).not.toBeInTheDocument();
  });

  it('asks to check kp on a version written under the parameter convention before engine 2.0', async () => {
    const old = v2();
    fakeProfile(designer, { ...old, version: { ...old.version, parameterConvention: 1 } });
    renderApp('/processes/p-bf180', { token: 'token-designer' });
    expect(await screen.findByText('Written before engine 2.0: check kp')).toBeInTheDocument();
    expect(screen.getByText(/multiply it by n \(or fit it again\)/)).toBeInTheDocument();
  });

  it('shows the version history and what changed between the last two versions', async () => {
    fakeProfile();
    renderApp('/processes/p-bf180', { token: 'token-designer' });
    const history = await screen.findByRole('table', { name: 'Version history' }, { timeout: 10_000 });
    expect(within(history).getByText('kp from the new lot')).toBeInTheDocument();
    const diff = await screen.findByRole('table', { name: 'Changes from v1 to v2' });
    const row = within(diff).getByRole('row', { name: /nmos\.kp/ });
    expect(within(row).getAllByRole('cell').map((c) => c.textContent)).toEqual(['nmos.kp', '290 µA/V²', '310 µA/V²', 'changed']);
  });

  it('lets everyone export, but offers editing to maintainers only', async () => {
    fakeProfile(designer);
    const designerView = renderApp('/processes/p-bf180', { token: 'token-designer' });
    await screen.findByRole('table', { name: 'Device parameters' }, { timeout: 10_000 });
    expect(screen.getByRole('button', { name: 'Export v2' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'More actions' })).not.toBeInTheDocument();
    designerView.unmount();

    fakeProfile(admin);
    renderApp('/processes/p-bf180', { token: 'token-admin' });
    expect(await screen.findByRole('link', { name: 'Edit' }, { timeout: 10_000 })).toHaveAttribute('href', '/processes/p-bf180/edit');
  });
});
