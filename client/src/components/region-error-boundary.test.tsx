import { MantineProvider } from '@mantine/core';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { RegionErrorBoundary } from './region-error-boundary';

let chartShouldFail = true;

function FlakyChart() {
  if (chartShouldFail) throw new Error('The sweep returned no points');
  return <p>Chart drawn</p>;
}

describe('a region error boundary', () => {
  it('keeps a failure inside its region and lets the user try again', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    render(
      <MantineProvider env="test">
        <p>Device table</p>
        <RegionErrorBoundary region="the chart">
          <FlakyChart />
        </RegionErrorBoundary>
      </MantineProvider>,
    );

    expect(screen.getByText('Device table')).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('Something went wrong in the chart');
    expect(screen.getByRole('alert')).toHaveTextContent('The sweep returned no points');

    chartShouldFail = false;
    await userEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(screen.getByText('Chart drawn')).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
