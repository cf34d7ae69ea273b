import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { workbenchHandlers } from '../../../test/fake-compute-api';
import { BF180G_WITH_CARD, NMOS_CHART, NMOS_TABLE } from '../../../test/fake-characterisation';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';

const ID = BF180G_WITH_CARD.id;

function fakeCharts(tables = [NMOS_TABLE]) {
  return installFakeApi({
    ...workbenchHandlers,
    'POST /api/compute/sweep': () => new Promise<never>(() => {}),
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    [`GET /api/processes/${ID}`]: { body: BF180G_WITH_CARD },
    [`GET /api/processes/${ID}/tables`]: { body: tables },
    [`GET /api/processes/${ID}/design-chart`]: { body: NMOS_CHART },
  });
}

/** The query of every design-chart request sent. */
function chartQueries(): URLSearchParams[] {
  return (globalThis.fetch as unknown as { mock: { calls: unknown[][] } }).mock.calls
    .map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname.endsWith('/design-chart'))
    .map((url) => url.searchParams);
}

describe('the gm/ID design charts of a characterised version', { timeout: 20_000 }, () => {
  // The axes themselves are drawn only in a real browser (jsdom has no layout): the browser journey reads them.
  it('shows ID/W, gm/gds, fT and VDSsat against gm/ID for the standard NMOS at the bias the server chose', async () => {
    fakeCharts();
    renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    for (const title of ['Current density ID/W against gm/ID', 'Intrinsic gain gm/gds against gm/ID', 'Transit frequency fT against gm/ID', 'VDSsat against gm/ID']) {
      const figure = await screen.findByRole('figure', { name: title }, { timeout: 10_000 });
      expect(await within(figure).findByText(/^TT, 27 °C, VDS = 900 mV, VSB = 0 V/)).toBeInTheDocument();
    }
    expect(within(screen.getByRole('figure', { name: 'Current density ID/W against gm/ID' })).getByText(/1 A\/m = 1 µA\/µm/)).toBeInTheDocument();
    expect(chartQueries()[0].toString()).toBe('version=2&polarity=nmos');
  });

  it("reads every length's figures at the gm/ID typed, between the table's points", async () => {
    fakeCharts();
    const { user } = renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    const readout = await screen.findByRole('table', { name: 'Figures at the chosen gm/ID' }, { timeout: 10_000 });
    const cells = () => within(readout).getAllByRole('row').slice(1).map((row) => within(row).getAllByRole('cell').map((c) => c.textContent));
    // 15 1/V lies half way between the short curve's 20 and 10, and 0.7 of the way from the long curve's 22 to 12.
    expect(cells()).toEqual([
      ['L = 180 nm', '450 mV', '5.5 A/m', '25', '6 GHz', '150 mV'],
      ['L = 1 µm', '470 mV', '1.46 A/m', '92', '760 MHz', '153 mV'],
    ]);
    const field = screen.getByRole('textbox', { name: 'Read at gm/ID' });
    await user.clear(field);
    await user.type(field, '21');
    await waitFor(() =>
      expect(cells()).toEqual([
        ['L = 180 nm', 'this length does not reach that gm/ID'],
        ['L = 1 µm', '410 mV', '380 mA/m', '116', '280 MHz', '99 mV'],
      ]),
    );
  });

  it('asks for another corner when one is picked', async () => {
    fakeCharts();
    const { user } = renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    await screen.findByRole('table', { name: 'Figures at the chosen gm/ID' }, { timeout: 10_000 });
    await user.click(screen.getByRole('combobox', { name: 'Corner' }));
    await user.click(await screen.findByRole('option', { name: 'SS' }));
    await waitFor(() => expect(chartQueries().at(-1)?.get('corner')).toBe('SS'));
  });

  it('says there are no tables yet instead of drawing empty charts', async () => {
    fakeCharts([]);
    renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    expect(await screen.findByText('No tables yet', {}, { timeout: 10_000 })).toBeInTheDocument();
    expect(screen.queryByRole('figure')).not.toBeInTheDocument();
  });

  it('shows VT against L at the bias the server chose', async () => {
    fakeCharts();
    renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    const figure = await screen.findByRole('figure', { name: 'Threshold voltage VT against L' }, { timeout: 10_000 });
    expect(await within(figure).findByText(/^TT, 27 °C, VDS = 900 mV, VSB = 0 V · the simulator’s VT/)).toBeInTheDocument();
    // The line itself is drawn only in a real browser; gm-id-charts-plotted.test.tsx checks the points handed to it.
  });

  it('opens the scratch device at the length and gm/ID chosen from the keyboard, with the chart’s device, bias and the table model', async () => {
    const api = fakeCharts();
    const { user } = renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
    await screen.findByRole('table', { name: 'Figures at the chosen gm/ID' }, { timeout: 10_000 });
    const field = screen.getByRole('textbox', { name: 'Read at gm/ID' });
    await user.clear(field);
    await user.type(field, '12');
    // The length select, worked from the keyboard: Tab from the gm/ID field, open, step to the second length, take it.
    await user.tab();
    expect(screen.getByRole('combobox', { name: 'Length' })).toHaveFocus();
    await user.keyboard('{ArrowDown}{ArrowDown}{Enter}');
    const link = await screen.findByRole('link', { name: 'Size a device at L = 1 µm, gm/ID = 12 1/V' });
    const href = new URL(link.getAttribute('href') ?? '', 'http://localhost');
    expect(href.pathname).toBe('/workbench');
    expect(Object.fromEntries(href.searchParams)).toEqual({
      processId: ID,
      version: '2',
      polarity: 'nmos',
      corner: 'TT',
      temperature: '27',
      vds: '0.9',
      vsb: '0',
      l: '0.000001',
      gmId: '12',
      model: 'table',
    });

    link.focus();
    await user.keyboard('{Enter}');
    await screen.findByRole('group', { name: 'Sizing targets' }, { timeout: 10_000 });
    expect(screen.getByRole('textbox', { name: 'L' })).toHaveValue('1 µm');
    expect(screen.getByRole('textbox', { name: 'gm/ID' })).toHaveValue('12');
    expect(screen.getByRole('textbox', { name: 'VDS' })).toHaveValue('900 mV');
    expect(screen.getByRole('combobox', { name: 'Process' })).toHaveValue(`${BF180G_WITH_CARD.name} · v2`);
    expect(await screen.findByRole('radio', { name: 'Tables' }, { timeout: 10_000 })).toBeChecked();
    await user.click(screen.getByRole('textbox', { name: 'ID' }));
    await user.paste('10u');
    await waitFor(() =>
      expect(api.to('POST /api/compute/size').at(-1)?.body).toMatchObject({ model: 'table', l: 1e-6, gmId: 12, vds: 0.9, vsb: 0, id: 10e-6, corner: 'TT', temperature: 27, polarity: 'nmos', processId: ID, processVersion: 2 }),
    );
  });
});
