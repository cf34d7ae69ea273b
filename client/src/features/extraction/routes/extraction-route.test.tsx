import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi } from '../../../test/fake-api';
import { admin, demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import { bf180Summary, extractionOf, fittedCurves, savedProfile } from '../testing/extraction-fixtures';

const csvFile = () => new File(['VGS [V],VDS [V],VSB [V],T [°C],ID [uA]\n0,1,0,27,0\n'], 'level1.csv', { type: 'text/csv' });

function fakeServer(options: { me?: typeof admin; create?: Parameters<typeof installFakeApi>[0][string]; states?: ReturnType<typeof extractionOf>[] } = {}) {
  const states = options.states ?? [extractionOf()];
  let asked = 0;
  let saved: ReturnType<typeof extractionOf> | null = null;
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: options.me ?? admin },
    'GET /api/processes': { body: [bf180Summary] },
    'POST /api/extractions': options.create ?? { status: 202, body: extractionOf({ status: 'queued', result: null }) },
    // Each GET answers the next state, and the last one from then on (a fit that runs, then is done).
    'GET /api/extractions/x-1': () => ({ body: saved ?? states[Math.min(asked++, states.length - 1)] }),
    'GET /api/extractions/x-1/points': { body: fittedCurves },
    'POST /api/extractions/x-1/save': () => {
      saved = extractionOf({ savedAs: { profileId: 'p-bf180', version: 2 }, process: { id: 'p-bf180', name: 'BF180-G', version: 1, latestVersion: 2 } });
      return { status: 201, body: savedProfile(2) };
    },
  });
}

/** Waits for a lazily loaded page's heading (the first import of a route takes a while on a busy machine). */
const opened = (name: string | RegExp) => screen.findByRole('heading', { level: 1, name }, { timeout: 10_000 });

describe('the parameter extraction pages', { timeout: 30_000 }, () => {
  it('uploads a curve file with the base profile, polarity and geometry, and opens the fit', async () => {
    const api = fakeServer();
    const { user, router } = renderApp('/extractions', { token: 'token-tobias' });
    await opened('Fit parameters to curves');
    await user.upload(await screen.findByLabelText('Choose a curve file'), csvFile());
    await user.click(screen.getByRole('combobox', { name: /Base profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    await user.click(screen.getByRole('radio', { name: 'Square law' }));
    await user.type(screen.getByRole('textbox', { name: /^W/ }), '10u');
    await user.type(screen.getByRole('textbox', { name: /^L/ }), '2 µm');
    expect(screen.getByText('= 10 µm')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Upload and fit' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/extractions/x-1'));
    const [sent] = api.to('POST /api/extractions');
    const body = sent.body as FormData;
    expect(Object.fromEntries([...body.entries()].filter(([key]) => key !== 'file'))).toEqual({ processId: 'p-bf180', polarity: 'nmos', model: 'square-law', w: '10u', l: '2 µm' });
    expect((body.get('file') as File).name).toBe('level1.csv');
  });

  it('asks for the base profile and the file before uploading anything', async () => {
    const api = fakeServer();
    const { user } = renderApp('/extractions', { token: 'token-tobias' });
    await opened('Fit parameters to curves');
    await user.click(await screen.findByRole('button', { name: 'Upload and fit' }));
    expect(await screen.findByText('Choose the profile the fit starts from')).toBeInTheDocument();
    await user.click(screen.getByRole('combobox', { name: /Base profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    await user.click(screen.getByRole('button', { name: 'Upload and fit' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Choose the curve file');
    expect(api.to('POST /api/extractions')).toHaveLength(0);
  });

  it('lists every problem of a refused curve file with its row and column', async () => {
    fakeServer({
      create: {
        ...errorBody(400, 'CURVE_FILE_INVALID', 'The curve file has a problem; nothing was stored', 'file'),
        body: { statusCode: 400, code: 'CURVE_FILE_INVALID', message: 'The curve file has a problem; nothing was stored', field: 'file', problems: [{ row: 4, field: 'ID [uA]', message: 'Row 4, column "ID [uA]": "abc" is not a number' }] },
      },
    });
    const { user } = renderApp('/extractions', { token: 'token-tobias' });
    await opened('Fit parameters to curves');
    await user.upload(await screen.findByLabelText('Choose a curve file'), csvFile());
    await user.click(screen.getByRole('combobox', { name: /Base profile/ }));
    await user.click(await screen.findByRole('option', { name: 'BF180-G' }));
    await user.click(screen.getByRole('button', { name: 'Upload and fit' }));

    const problems = await screen.findByRole('table', { name: 'Problems in the curve file' });
    expect(within(problems).getByRole('row', { name: /ID \[uA\]/ })).toHaveTextContent('4ID [uA]Row 4, column "ID [uA]": "abc" is not a number');
    expect(screen.getByText('The curve file was refused; nothing was stored')).toBeInTheDocument();
  });

  it('shows the progress of a running fit, then its parameters with units and errors, the error per region and the points left out', async () => {
    fakeServer({ states: [extractionOf({ status: 'running', result: null, progress: { iterations: 40, maxIterations: 300 } }), extractionOf()] });
    renderApp('/extractions/x-1', { token: 'token-tobias' });
    await opened('Fit of level1.csv');
    expect(await screen.findByText(/Fitting: 40 of at most 300 iterations/)).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Fit progress' })).toBeInTheDocument();

    const parameters = await screen.findByRole('table', { name: 'Fitted parameters' }, { timeout: 4000 });
    expect(within(parameters).getByRole('row', { name: /VT0/ })).toHaveTextContent(/600\.2 mV.*± 170 µV/);
    expect(within(parameters).getByRole('row', { name: /KP/ })).toHaveTextContent(/120 µA\/V²± 48 nA\/V²/);
    expect(within(screen.getByRole('table', { name: 'Error per region' })).getByRole('row', { name: /All points/ })).toHaveTextContent('All points23041.0 %');
    expect(within(screen.getByRole('table', { name: 'Points left out' })).getByRole('row', { name: /below threshold/ })).toHaveTextContent(/2\s*3, 4/);
    expect(screen.getByRole('table', { name: 'Parameters held' })).toHaveTextContent('needs curves at several temperatures');
    expect(await screen.findByRole('figure', { name: 'ID against VGS, log axis' })).toBeInTheDocument();
    expect(screen.getByRole('figure', { name: 'ID against VGS, linear axis' })).toBeInTheDocument();
    expect(screen.getByRole('figure', { name: 'Residuals of the fit' })).toBeInTheDocument();
  });

  it('says when a fit did not converge and that its values are the last estimate', async () => {
    fakeServer({ states: [extractionOf({ result: { ...extractionOf().result!, converged: false, iterations: 20 } })] });
    renderApp('/extractions/x-1', { token: 'token-tobias' });
    await opened('Fit of level1.csv');
    expect(await screen.findByText('The fit did not converge')).toBeInTheDocument();
    expect(screen.getByText(/after 20 iterations; the values below are its last estimate/)).toBeInTheDocument();
  });

  it('lets a maintainer save the fit as a new version, then links to it', async () => {
    const api = fakeServer();
    const { user } = renderApp('/extractions/x-1', { token: 'token-tobias' });
    await opened('Fit of level1.csv');
    await user.type(await screen.findByRole('textbox', { name: 'What the version changes' }), 'Fitted to lot 7');
    await user.click(screen.getByRole('button', { name: 'Save as BF180-G version 2' }));
    expect(api.to('POST /api/extractions/x-1/save').map((r) => r.body)).toEqual([{ message: 'Fitted to lot 7' }]);
    expect(await screen.findByRole('link', { name: 'BF180-G version 2' })).toHaveAttribute('href', '/processes/p-bf180');
  });

  it('offers a designer no save, and says who can', async () => {
    fakeServer({ me: designer });
    renderApp('/extractions/x-1', { token: 'token-ines' });
    await opened('Fit of level1.csv');
    expect(await screen.findByText('A process maintainer can save this fit as a new version of BF180-G.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Save as/ })).not.toBeInTheDocument();
  });
});
