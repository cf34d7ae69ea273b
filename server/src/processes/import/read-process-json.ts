import { type ModelCardInput, processFileSchema, type Problem, type Process } from '@channelwright/shared/schemas';

export type ProcessFileReading = { ok: true; definition: Process; nodeClass?: string; modelCard?: ModelCardInput } | { ok: false; problems: Problem[] };

/**
 * Reads our JSON process file (processFileSchema: format, schemaVersion, process). Numbers are plain
 * SI values. A syntax error is reported with its line as the row; a schema problem by its dotted field.
 */
export function readProcessJson(text: string): ProcessFileReading {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    return { ok: false, problems: [{ row: lineOfSyntaxError(text, message), field: 'file', message: `Not valid JSON: ${message}` }] };
  }
  const parsed = processFileSchema.safeParse(data);
  if (!parsed.success) {
    return {
      ok: false,
      problems: parsed.error.issues.map((issue) => ({
        field: issue.path.length > 0 ? issue.path.map(String).join('.') : 'file',
        message: issue.message,
      })),
    };
  }
  return { ok: true, definition: parsed.data.process, nodeClass: parsed.data.nodeClass, modelCard: parsed.data.modelCard };
}

/** V8 says "… at position 58" or "… (line 3 column 5)"; the row is the line, 1 when it says neither. */
function lineOfSyntaxError(text: string, message: string): number {
  const line = /line (\d+)/.exec(message);
  if (line) return Number(line[1]);
  const position = /position (\d+)/.exec(message);
  if (!position) return 1;
  return text.slice(0, Number(position[1])).split('\n').length;
}
