import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi, type FakeResponse } from '../../../test/fake-api';
import { BF180G_CARD, BF180G_WITH_CARD } from '../../../test/fake-characterisation';
import { BF180G_PROFILE } from '../../../test/fake-compute-api';
import { admin, demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

const ID = BF180G_PROFILE.id;
// An invented card for these tests (not any foundry's model): a .control block and an .include are refused by line.
const REFUSED_CARD = ['* invented test card', '.model n1 nmos level=54 vth0=0.4', '.control', 'run', '.endc', '.include other.lib'].join('\n');

function fakeProfile(me: typeof admin, profile = BF180G_WITH_CARD, handlers: Record<string, FakeResponse> = {}) {
  return installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: me },
    [`GET /api/processes/${ID}`]: { body: profile },
    [`GET /api/processes/${ID}/versions`]: { body: [] },
    [`GET /api/processes/${ID}/characterisations`]: { body: [] },
    [`GET /api/processes/${ID}/tables`]: { body: [] },
    [`GET /api/processes/${ID}/model-card`]: { body: { ...BF180G_CARD, text: '* Invented model card of BF180-G\n.lib tt\n.model bfn18 nmos level=54 vth0=0.45\n.endl tt\n' } },
    ...handlers,
  });
}

const cardFile = (text: string) => new File([text], 'bf180g-lot7.lib', { type: 'text/plain' });

describe("a process version's model card", { timeout: 20_000 }, () => {
  it('shows its sections by corner, its models by device, its SHA-256 and, on request, the text the simulator is given', async () => {
    fakeProfile(designer);
    const { user } = renderApp(`/processes/${ID}`, { token: 'token-designer' });
    const region = await screen.findByRole('region', { name: 'Model card' }, { timeout: 10_000 });
    const corners = within(region).getByRole('table', { name: 'Corners and card sections' });
    expect(within(corners).getByRole('row', { name: /FS/ })).toHaveTextContent('FS.lib fs');
    const models = within(region).getByRole('table', { name: 'Card models and devices' });
    expect(within(models).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent))).toEqual([
      ['bfn18', 'nmos 54', 'NMOS'],
      ['bfp18', 'pmos 54', 'PMOS'],
    ]);
    expect(within(region).getByLabelText('Model card SHA-256')).toHaveTextContent(BF180G_CARD.sha256);
    expect(within(region).queryByRole('button', { name: /Upload a card/ })).not.toBeInTheDocument();
    await user.click(within(region).getByRole('button', { name: 'View the card text' }));
    expect(await screen.findByLabelText('Model card text')).toHaveTextContent('.model bfn18 nmos level=54 vth0=0.45');
  });

  it('says when a version has no card, and offers no characterisation', async () => {
    fakeProfile(designer, BF180G_PROFILE);
    renderApp(`/processes/${ID}`, { token: 'token-designer' });
    const region = await screen.findByRole('region', { name: 'Model card' }, { timeout: 10_000 });
    expect(region).toHaveTextContent('No model card on this version');
    expect(screen.queryByRole('region', { name: 'Characterisation' })).not.toBeInTheDocument();
  });

  it('lists every refused line of an uploaded card with its line number, and stores nothing', async () => {
    const api = fakeProfile(admin, BF180G_WITH_CARD, {
      'POST /api/processes/model-cards/check': {
        body: {
          ok: false,
          card: null,
          problems: [
            { line: 3, field: 'card', message: 'a .control block runs simulator commands' },
            { line: 6, field: 'card', message: 'reads another file; paste its models instead' },
          ],
        },
      },
    });
    const { user } = renderApp(`/processes/${ID}`, { token: 'token-admin' });
    await user.click(await screen.findByRole('button', { name: 'Upload a card as v3' }, { timeout: 10_000 }));
    await user.upload(await screen.findByLabelText('Choose a model card file'), cardFile(REFUSED_CARD));
    const problems = await screen.findByRole('table', { name: 'Problems in the model card' });
    expect(within(problems).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent))).toEqual([
      ['3', 'a .control block runs simulator commands'],
      ['6', 'reads another file; paste its models instead'],
    ]);
    const sent = api.to('POST /api/processes/model-cards/check')[0].body as FormData;
    expect([sent.get('profileId'), sent.get('version'), (sent.get('file') as File).name]).toEqual([ID, '2', 'bf180g-lot7.lib']);
    expect(screen.queryByRole('button', { name: 'Save as version 3' })).not.toBeInTheDocument();
    expect(api.to('POST /api/processes/import')).toHaveLength(0);
  });

  it('shows the mapping of a clean card and uploads it as the next version through the import', async () => {
    const api = fakeProfile(admin, BF180G_WITH_CARD, {
      'POST /api/processes/model-cards/check': { body: { ok: true, problems: [], card: BF180G_CARD } },
      'POST /api/processes/import': { status: 201, body: { ...BF180G_WITH_CARD, latestVersion: 3 } },
    });
    const { user } = renderApp(`/processes/${ID}`, { token: 'token-admin' });
    await user.click(await screen.findByRole('button', { name: 'Upload a card as v3' }, { timeout: 10_000 }));
    await user.upload(await screen.findByLabelText('Choose a model card file'), cardFile('* invented\n.model bfn18 nmos level=54\n'));
    const dialog = await screen.findByRole('dialog');
    expect(await within(dialog).findByText(/The card reads cleanly/)).toBeInTheDocument();
    expect(within(within(dialog).getByRole('table', { name: 'Corners and card sections' })).getByRole('row', { name: /TT/ })).toHaveTextContent('TT.lib tt');
    await user.type(within(dialog).getByRole('textbox', { name: 'What changed' }), 'card of lot 7');
    await user.click(within(dialog).getByRole('button', { name: 'Save as version 3' }));
    await waitFor(() => expect(api.to('POST /api/processes/import')).toHaveLength(1));
    const sent = api.to('POST /api/processes/import')[0].body as FormData;
    expect([sent.get('profileId'), sent.get('baseVersion'), sent.get('message'), (sent.get('file') as File).name]).toEqual([ID, '2', 'card of lot 7', 'bf180g-lot7.lib']);
  });
});
