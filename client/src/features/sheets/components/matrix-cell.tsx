import type { LimitStatus, MatrixCell as Cell, MatrixFigure } from '@channelwright/shared/schemas';
import { Table, Tooltip } from '@mantine/core';
import { IconAlertTriangle, IconTarget, IconX } from '@tabler/icons-react';
import { figureText } from '../model/matrix-figures';
import classes from './corner-matrix.module.css';

export const STATUS_WORDS: Record<LimitStatus, string> = { fail: 'fails its limit', tight: 'within 10 % of its limit', ok: 'inside its limit', none: 'no limit' };

/** The status a cell shows: a cell without an answer fails. */
export const statusOf = (cell: Cell, figure: MatrixFigure): LimitStatus => (cell.error ? 'fail' : cell.status[figure]);

export function StatusIcon({ status, size = 13 }: { status: LimitStatus; size?: number }) {
  if (status === 'fail') return <IconX size={size} className={classes.icon} aria-hidden />;
  if (status === 'tight') return <IconAlertTriangle size={size} className={classes.icon} aria-hidden />;
  return null;
}

interface MatrixCellProps {
  cell: Cell;
  figure: MatrixFigure;
  where: string;
  worst: boolean;
  groupStart: boolean;
}

/** One cell: the figure's value, coloured and marked by its margin to the device's limit, the row's worst outlined. */
export function MatrixCell({ cell, figure, where, worst, groupStart }: MatrixCellProps) {
  const status = statusOf(cell, figure);
  const text = cell.error ? 'no answer' : figureText(figure, cell.values[figure]);
  const label = `${where}: ${text}${status === 'none' ? '' : `, ${STATUS_WORDS[status]}`}${worst ? ', worst of the row' : ''}`;
  const className = [classes.cell, status !== 'none' ? classes[status] : '', worst ? classes.worst : '', groupStart ? classes.groupStart : ''].join(' ');
  const content = (
    <Table.Td className={className} data-status={status} data-worst={worst || undefined} aria-label={label} title={cell.error?.message}>
      {worst && <IconTarget size={13} className={classes.icon} aria-hidden />}
      <StatusIcon status={status} />
      {cell.error ? '—' : figureText(figure, cell.values[figure])}
    </Table.Td>
  );
  return cell.error ? (
    <Tooltip label={cell.error.message} multiline w={300}>
      {content}
    </Tooltip>
  ) : (
    content
  );
}
