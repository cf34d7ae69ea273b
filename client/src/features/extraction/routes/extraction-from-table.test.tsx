import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { admin, demoConfig } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { bf180NmosTable, bf180Summary, fittedCurves, tableExtraction } from '../testing/extraction-fixtures';

function fakeServer(options: { tables?: unknown[]; create?: Parameters<typeof installFakeApi>[0][string] } = {}) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: admin },
    'GET /api/processes': { body: [bf180Summary] },
    'GET /api/processes/p-bf180/tables': { body: options.tables ?? [bf180NmosTable] },
    'POST /api/extractions/from-table': options.create ?? { status: 202, body: tableExtraction() },
    'GET /api/extractions/x-1': { body: tableExtraction() },
    'GET /api/extractions/x-1/points': { body: fittedCurves },
  });
}

const opened = (name: string | RegExp) => screen.findByRole('heading', { level: 1, name }, { timeout: 10_000 });

async function chooseTableSource(user: ReturnType<typeof renderApp>['user']) {
  await opened('Fit parameters to curves');
  await user.click(screen.getByRole('radio', { name: 'From characterised tables' }));
  await user.click(await screen.findByRole('combobox', { name: /^Profile/ }));
  await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
}

describe('fitting a profile to a characterised table', { timeout: 30_000 }, () => {
  it('picks the version\'s device table, its corner and some lengths, sends them, and opens the fit that names the table', async () => {
    const api = fakeServer();
    const { user, router } = renderApp('/extractions', { token: 'token-tobias' });
    await chooseTableSource(user);
    await user.click(await screen.findByRole('combobox', { name: /^Device/ }));
    await user.click(await screen.findByRole('option', { name: 'NMOS (bfn18)' }));
    expect(screen.getByRole('combobox', { name: /^Version/ })).toHaveValue('v1 (latest)');
    expect(screen.getByRole('combobox', { name: /^Corner/ })).toHaveValue('TT');
    await user.click(screen.getByRole('combobox', { name: /^Corner/ }));
    await user.click(await screen.findByRole('option', { name: 'FF' }));
    await user.click(screen.getByRole('checkbox', { name: '1 µm' }));
    await user.click(screen.getByRole('checkbox', { name: '500 nm' }));
    await user.click(screen.getByRole('radio', { name: 'Square law' }));
    await user.click(screen.getByRole('button', { name: 'Fit to the table' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/extractions/x-1'));
    expect(api.to('POST /api/extractions/from-table').map((r) => r.body)).toEqual([
      { processId: 'p-bf180', version: 1, polarity: 'nmos', flavour: null, corner: 'FF', lengths: [0.5e-6, 1e-6], model: 'square-law' },
    ]);
    expect(await opened('Fit of the TT lines of the NMOS table of BF180-G version 1')).toBeInTheDocument();
    expect(screen.getByText(/Points of the characterised table t-nmos \(card model bfn18, table SHA-256 cdcdcdcdcdcd…\) kept as BF180-G-v1-nmos-TT-table.csv/)).toBeInTheDocument();
  });

  it('asks for a device, says when the version has no tables, and sends nothing', async () => {
    const api = fakeServer({ tables: [] });
    const { user } = renderApp('/extractions', { token: 'token-tobias' });
    await chooseTableSource(user);
    expect(await screen.findByText('Version 1 of BF180-G has no characterised tables: a maintainer characterises its model card first.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Fit to the table' }));
    expect(await screen.findByText('Choose a characterised device')).toBeInTheDocument();
    expect(api.to('POST /api/extractions/from-table')).toHaveLength(0);
  });

  it('shows the server\'s refusal beside the field it names', async () => {
    fakeServer({ create: errorBody(409, 'TABLE_NOT_READY', 'The NMOS table of this process version is not ready: its characterisation is running (40 % done)', 'polarity') });
    const { user } = renderApp('/extractions', { token: 'token-tobias' });
    await chooseTableSource(user);
    await user.click(await screen.findByRole('combobox', { name: /^Device/ }));
    await user.click(await screen.findByRole('option', { name: 'NMOS (bfn18)' }));
    await user.click(screen.getByRole('button', { name: 'Fit to the table' }));
    expect(await screen.findByText(/The NMOS table of this process version is not ready/)).toBeInTheDocument();
    expect(screen.queryByText('Not started')).not.toBeInTheDocument();
  });
});
