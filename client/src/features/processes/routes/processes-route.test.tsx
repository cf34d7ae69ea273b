import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, type FakeResponse } from '../../../test/fake-api';
import { admin, demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { bf130, bf180, summaryOf } from '../testing/profiles';

function fakeLibrary(me = admin, importAnswer: FakeResponse = { body: bf180() }) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: me },
    'GET /api/processes': { body: [summaryOf(bf130()), summaryOf(bf180())] },
    'GET /api/processes/p-bf180': { body: bf180() },
    'GET /api/processes/p-bf180/versions': { body: [] },
    'POST /api/processes/import': importAnswer,
  });
}

const REFUSAL = {
  status: 400,
  body: {
    statusCode: 400,
    code: 'IMPORT_INVALID',
    message: 'The file has 2 problems; nothing was stored',
    field: 'file',
    problems: [
      { row: 12, field: 'unit', message: 'kp (nmos) takes a transconductance parameter (A/V²), but its unit "V" is a voltage (V)' },
      { field: 'parameter', message: 'vdd is missing: add a row vdd,process,<value>,V' },
    ],
  },
};

const csvFile = () => new File(['parameter,polarity,value,unit\nkp,nmos,310u,V\n'], 'bf160.csv', { type: 'text/csv' });

// Generous: a busy two-core machine renders the page with its dialog slowly under jsdom.
describe('the process library page', { timeout: 15_000 }, () => {
  it('lists the profiles with node class, VDD, corners, version and who changed them, marking invented demo data', async () => {
    fakeLibrary(designer);
    renderApp('/processes', { token: 'token-designer' });
    const table = await screen.findByRole('table', { name: 'Process profiles' });
    const row = within(table).getByRole('row', { name: /BF180-G/ });
    expect(within(row).getByText('invented demo data')).toBeInTheDocument();
    expect(within(row).getByText('180 nm')).toBeInTheDocument();
    expect(within(row).getByText('1.8 V')).toBeInTheDocument();
    expect(within(row).getByText('TT FF SS FS SF')).toBeInTheDocument();
    expect(within(row).getByText('v1')).toBeInTheDocument();
    expect(within(row).getByText(new RegExp(admin.displayName))).toBeInTheDocument();
    expect(within(table).getAllByRole('row')).toHaveLength(3);
  });

  it('offers import and new profile to maintainers only', async () => {
    fakeLibrary(designer);
    renderApp('/processes', { token: 'token-designer' });
    await screen.findByRole('table', { name: 'Process profiles' });
    expect(screen.queryByRole('button', { name: 'Import' })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New profile' })).not.toBeInTheDocument();
  });

  it('searches and shows deprecated profiles through the query string', async () => {
    fakeLibrary(designer);
    const { user } = renderApp('/processes', { token: 'token-designer' });
    await screen.findByRole('table', { name: 'Process profiles' });
    expect(fetchUrls()).toContain('/api/processes');
    await user.type(screen.getByLabelText('Search'), '130');
    await user.click(screen.getByRole('switch', { name: 'Show deprecated' }));
    await waitFor(() => expect(fetchUrls()).toContain('/api/processes?search=130&includeDeprecated=true'));
  });

  it('lists every problem of a refused file by row and field beside it', async () => {
    const api = fakeLibrary(admin, REFUSAL);
    const { user } = renderApp('/processes', { token: 'token-admin' });
    await user.click(await screen.findByRole('button', { name: 'Import' }));
    await user.upload(await screen.findByLabelText('Choose a process file'), csvFile());

    const problems = await screen.findByRole('table', { name: 'Problems in the file' });
    const rows = within(problems).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getAllByRole('cell').map((c) => c.textContent))).toEqual([
      ['12', 'unit', 'kp (nmos) takes a transconductance parameter (A/V²), but its unit "V" is a voltage (V)'],
      ['—', 'parameter', 'vdd is missing: add a row vdd,process,<value>,V'],
    ]);
    expect(screen.getByText('bf160.csv was refused')).toBeInTheDocument();
    expect(screen.getByText('The file has 2 problems; nothing was stored')).toBeInTheDocument();
    const sent = api.to('POST /api/processes/import')[0].body as FormData;
    expect((sent.get('file') as File).name).toBe('bf160.csv');
  });

  it('opens the imported profile when the file is accepted', async () => {
    fakeLibrary(admin);
    const { user, router } = renderApp('/processes', { token: 'token-admin' });
    await user.click(await screen.findByRole('button', { name: 'Import' }));
    await user.upload(await screen.findByLabelText('Choose a process file'), csvFile());
    await waitFor(() => expect(router.state.location.pathname).toBe('/processes/p-bf180'));
  });
});

/** The paths and queries fetch was called with. */
function fetchUrls(): string[] {
  return (globalThis.fetch as unknown as { mock: { calls: unknown[][] } }).mock.calls.map(([input]) => {
    const url = new URL(String(input), 'http://localhost');
    return `${url.pathname}${url.search}`;
  });
}
