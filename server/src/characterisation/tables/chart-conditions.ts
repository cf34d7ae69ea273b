import type { DesignChartConditions, TableGrid } from '@channelwright/shared/device';
import type { DesignChartQuery, Process } from '@channelwright/shared/schemas';

/** The grid value nearest a target. */
function nearest(values: readonly number[], target: number): number {
  return values.reduce((best, value) => (Math.abs(value - target) < Math.abs(best - target) ? value : best), values[0]);
}

/**
 * Where the design charts are read when the query does not say: TT (else the table's first corner), tnom (else the
 * characterised temperature nearest it), the characterised VDS nearest VDD/2 (saturation for most devices), and the
 * lowest characterised VSB (0 on the default grid).
 */
export function chartConditions(grid: TableGrid, definition: Process, query: Pick<DesignChartQuery, 'corner' | 'temperature' | 'vds' | 'vsb'>): DesignChartConditions {
  return {
    corner: query.corner ?? grid.corners.find((corner) => corner.toLowerCase() === 'tt') ?? grid.corners[0],
    temperature: query.temperature ?? nearest(grid.temperatures, definition.tnom),
    vds: query.vds ?? nearest(grid.vds, definition.vdd / 2),
    vsb: query.vsb ?? grid.vsb[0],
  };
}
