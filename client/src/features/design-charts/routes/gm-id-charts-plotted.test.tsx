import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { installFakeApi } from '../../../test/fake-api';
import { BF180G_WITH_CARD, NMOS_CHART, NMOS_TABLE } from '../../../test/fake-characterisation';
import { demoConfig, designer } from '../../../test/fixtures';
import { renderApp } from '../../../test/render-app';
import type { ChartData } from '../model/chart-series';
import type { AxisSpec } from '../components/chart/sweep-chart';

/**
 * jsdom has no layout, so Recharts draws no lines here: the chart is replaced by a list of the points it is handed,
 * one button per point standing in for a click on it (which point Recharts finds under the pointer is its own
 * business; the browser journey clicks the real plot).
 */
vi.mock('../components/chart/sweep-chart', () => ({
  SweepChart: ({ data, x, y, onPickX }: { data: ChartData; x: AxisSpec; y: AxisSpec; onPickX?: (x: number, row: ChartData['rows'][number]) => void }) => (
    <ul aria-label={`${y.symbol} against ${x.symbol}${x.log ? ' (log)' : ''}`}>
      {data.rows.flatMap((row) =>
        data.series
          .filter((s) => typeof row[s.key] === 'number')
          .map((s) => (
            <li key={`${s.key}-${row.x}`}>
              <button type="button" disabled={!onPickX} onClick={() => onPickX?.(row.x, row)}>{`${s.label}: (${row.x}, ${row[s.key]})`}</button>
            </li>
          )),
      )}
    </ul>
  ),
}));

const ID = BF180G_WITH_CARD.id;

function openCharts() {
  installFakeApi({
    'GET /api/config': { body: demoConfig },
    'GET /api/auth/me': { body: designer },
    [`GET /api/processes/${ID}`]: { body: BF180G_WITH_CARD },
    [`GET /api/processes/${ID}/tables`]: { body: [NMOS_TABLE] },
    [`GET /api/processes/${ID}/design-chart`]: { body: NMOS_CHART },
  });
  return renderApp(`/processes/${ID}/design-charts?version=2`, { token: 'token-designer' });
}

const points = (list: HTMLElement) => within(list).getAllByRole('button').map((b) => b.textContent);

describe('what the gm/ID design charts plot and pick', { timeout: 20_000 }, () => {
  it("plots VT against L as one line on a log length axis through the answer's VT at each length", async () => {
    openCharts();
    const list = await screen.findByRole('list', { name: 'VT against L (log)' }, { timeout: 10_000 });
    // The fake answer's vt: 400 mV at 180 nm and 450 mV at 1 µm.
    expect(points(list)).toEqual(['VT: (1.8e-7, 0.4)', 'VT: (0.000001, 0.45)']);
    // VT is not a gm/ID chart: a click there picks nothing.
    expect(within(list).getAllByRole('button').every((b) => (b as HTMLButtonElement).disabled)).toBe(true);
  });

  it('takes the length and gm/ID of a clicked point on a gm/ID chart into the device link and the readout', async () => {
    const { user } = openCharts();
    const gain = await screen.findByRole('list', { name: 'gm/gds against gm/ID' }, { timeout: 10_000 });
    expect(points(gain)).toEqual(['L = 180 nm: (5, 10)', 'L = 1 µm: (6, 40)', 'L = 180 nm: (10, 20)', 'L = 1 µm: (12, 80)', 'L = 180 nm: (20, 30)', 'L = 1 µm: (22, 120)']);
    await user.click(within(gain).getByRole('button', { name: 'L = 1 µm: (12, 80)' }));

    const link = await screen.findByRole('link', { name: 'Size a device at L = 1 µm, gm/ID = 12 1/V' });
    const href = new URL(link.getAttribute('href') ?? '', 'http://localhost');
    expect(href.searchParams.get('l')).toBe('0.000001');
    expect(href.searchParams.get('gmId')).toBe('12');
    expect(screen.getByRole('textbox', { name: 'Read at gm/ID' })).toHaveValue('12');
    expect(screen.getByRole('combobox', { name: 'Length' })).toHaveValue('1 µm');

    await user.click(within(screen.getByRole('list', { name: 'ID/W against gm/ID' })).getByRole('button', { name: 'L = 180 nm: (20, 1)' }));
    expect(await screen.findByRole('link', { name: 'Size a device at L = 180 nm, gm/ID = 20 1/V' })).toHaveAttribute('href', expect.stringContaining('l=1.8e-7'));
  });
});
