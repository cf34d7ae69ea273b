import { parameterInfo, processSchema, type Problem } from '@channelwright/shared/schemas';
import type { ProcessFileReading } from './read-process-json.js';
import { readCsvRecords } from './csv-records.js';
import { CsvProcessDraft } from './csv-process-draft.js';
import { csvKey, csvLabel, readTarget } from './csv-targets.js';
import { readNumberCell } from './csv-value.js';
import type { z } from 'zod';

/**
 * Reads a process from CSV rows `parameter,polarity,value,unit` (layout in docs/processes.md):
 * every problem is listed by row (the header is row 1) and column, or by parameter when a row is
 * missing; any problem refuses the whole file.
 */
export function readProcessCsv(text: string): ProcessFileReading {
  const { records, problems } = readCsvRecords(text);
  const draft = new CsvProcessDraft();
  const firstRow = new Map<string, number>();

  for (const record of records) {
    const reading = readTarget(record.parameter, record.polarity);
    if (!reading.ok) {
      problems.push({ row: record.row, field: reading.field, message: reading.message });
      continue;
    }
    const { target, parameter } = reading;
    const label = csvLabel(parameter, record.polarity);
    const key = csvKey(parameter, record.polarity);
    const earlier = firstRow.get(key);
    if (earlier !== undefined) {
      problems.push({ row: record.row, field: 'parameter', message: `${label} is given twice (rows ${earlier} and ${record.row}): keep one` });
      continue;
    }
    firstRow.set(key, record.row);
    let value: number | string = record.value;
    if (target.info) {
      const cell = readNumberCell(record.value, record.unit, target.info, label);
      if (!cell.ok) {
        problems.push({ row: record.row, field: cell.field, message: cell.message });
        continue;
      }
      value = cell.value;
    } else if (record.unit !== '') {
      problems.push({ row: record.row, field: 'unit', message: `${label} is text: leave its unit empty` });
      continue;
    }
    const contradiction = draft.set(target, value, record.row, parameter);
    if (contradiction) problems.push({ row: record.row, field: 'polarity', message: contradiction });
  }
  if (problems.length > 0) return { ok: false, problems };

  const candidate = draft.build();
  const parsed = processSchema.safeParse(candidate);
  if (!parsed.success) return { ok: false, problems: parsed.error.issues.map((issue) => schemaProblem(issue, candidate, draft)) };
  return { ok: true, definition: parsed.data, nodeClass: draft.nodeClass };
}

/** A schema problem located in the file: the row of the value, or the row to add when it is missing. */
function schemaProblem(issue: z.core.$ZodIssue, candidate: Record<string, unknown>, draft: CsvProcessDraft): Problem {
  const path = namedPath(issue.path, candidate);
  const source = draft.sourceOf(path);
  if (source && valueAt(candidate, issue.path) !== undefined) return { row: source.row, field: 'value', message: `${source.label}: ${issue.message}` };
  const cell = draft.cellOf(path);
  if (!cell) return { field: path || 'file', message: issue.message };
  const unit = parameterInfo(cell.parameter.split('.').at(-1)!)?.unit ?? '';
  return {
    field: 'parameter',
    message: `${csvLabel(cell.parameter, cell.polarity)} is missing: add a row ${cell.parameter},${cell.polarity},<value>,${unit}`,
  };
}

/** The issue's path with corner and flavour indexes replaced by their names: corners.FF.nmos.dvt. */
function namedPath(path: PropertyKey[], candidate: Record<string, unknown>): string {
  const [head, index, ...rest] = path;
  if ((head === 'corners' || head === 'flavours') && typeof index === 'number') {
    const list = candidate[head] as Array<{ name: string }>;
    return [head, list[index]?.name ?? index, ...rest].map(String).join('.');
  }
  return path.map(String).join('.');
}

function valueAt(candidate: unknown, path: PropertyKey[]): unknown {
  return path.reduce<unknown>((node, key) => (node !== null && typeof node === 'object' ? (node as Record<PropertyKey, unknown>)[key] : undefined), candidate);
}
