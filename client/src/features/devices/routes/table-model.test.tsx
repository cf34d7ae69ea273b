import { BF180G, computeSize } from '@channelwright/shared/device';
import type { SizeRequestInput } from '@channelwright/shared/schemas';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, installFakeApi, type RecordedRequest } from '../../../test/fake-api';
import { NMOS_TABLE } from '../../../test/fake-characterisation';
import { workbenchHandlers } from '../../../test/fake-compute-api';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

const TABLE_ACCURACY_SUMMARY = 'Interpolated in tables simulated from the model card: ID within 1 % at characterised lengths';

/**
 * The compute API as the server answers model "table": the sizing itself is not what these tests check (the engine's
 * and the server's tests do, against ngspice), only that the page says which model made the result and how good it is.
 */
function tableSize({ body }: RecordedRequest) {
  const request = body as SizeRequestInput;
  if (request.model !== 'table') return { body: computeSize(request as never, BF180G) };
  const result = computeSize({ ...request, model: 'all-region' } as never, BF180G);
  return {
    body: {
      ...result,
      model: 'table',
      accuracy: { basis: 'table', summary: TABLE_ACCURACY_SUMMARY },
      table: { id: NMOS_TABLE.id, sha256: NMOS_TABLE.sha256, characterisationId: 'job-1', model: 'bfn18' },
      analyticFigures: ['sigmaVt', 'leakage.gate'],
    },
  };
}

function fakeServer(tables: unknown[], size: (request: RecordedRequest) => { status?: number; body: unknown } = tableSize) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    ...workbenchHandlers,
    'GET /api/processes/p-bf180g/tables': { body: tables },
    'POST /api/compute/size': size,
    'POST /api/compute/sweep': () => new Promise<never>(() => {}),
  });
}

async function sizeOnTables(user: ReturnType<typeof renderApp>['user']) {
  await user.click(await screen.findByRole('radio', { name: 'Tables' }, { timeout: 10_000 }));
  for (const [name, text] of [['ID', '20u'], ['L', '0.5u'], ['VOV', '0.2']]) {
    await user.click(screen.getByRole('textbox', { name }));
    await user.paste(text);
  }
}

describe('the table model in the device editor', { timeout: 20_000 }, () => {
  it('is offered only when the process version has tables', async () => {
    fakeServer([]);
    renderApp('/workbench', { token: 'token-ines' });
    await screen.findByRole('radio', { name: 'All-region' }, { timeout: 10_000 });
    expect(screen.queryByRole('radio', { name: 'Tables' })).not.toBeInTheDocument();
    expect(screen.getByLabelText('Model in use')).toHaveTextContent('the table model comes with a characterised model card');
  });

  it('sizes with model "table" and says which model and table made the result and how far it is known to be off', async () => {
    const api = fakeServer([NMOS_TABLE]);
    const { user } = renderApp('/workbench', { token: 'token-ines' });
    await sizeOnTables(user);
    await waitFor(() => expect(api.to('POST /api/compute/size').at(-1)?.body).toMatchObject({ model: 'table', id: 20e-6, l: 0.5e-6, vov: 0.2 }));
    const note = await screen.findByRole('note', { name: 'Model and accuracy' });
    expect(within(note).getByText('Tables from the model card')).toBeInTheDocument();
    expect(within(note).getByLabelText('Accuracy basis')).toHaveTextContent('basis: table');
    expect(within(note).getByText(TABLE_ACCURACY_SUMMARY)).toBeInTheDocument();
    expect(within(note).getByText(`bfn18 · table ${NMOS_TABLE.sha256.slice(0, 12)}`)).toBeInTheDocument();
    expect(within(note).getByText('Not in the tables, from the all-region model: σ(ΔVT), gate leakage.')).toBeInTheDocument();
  });

  it('says a device is waiting for its table while the characterisation runs', async () => {
    fakeServer([NMOS_TABLE], ({ body }) =>
      (body as SizeRequestInput).model === 'table'
        ? errorBody(409, 'TABLE_NOT_READY', 'The tables of BF180-G v2 are being characterised (41 % done)', 'model')
        : { body: computeSize(body as never, BF180G) },
    );
    const { user } = renderApp('/workbench', { token: 'token-ines' });
    await sizeOnTables(user);
    const waiting = (await screen.findByText('Waiting for a table', {}, { timeout: 5000 })).closest('[role="status"]') as HTMLElement;
    expect(waiting).toHaveTextContent('The tables of BF180-G v2 are being characterised (41 % done) The device is sized as soon as the characterisation finishes.');
    expect(screen.queryByText('This device cannot be sized as asked')).not.toBeInTheDocument();
  });
});
