import { fieldOfIssue, updateSheetRequestSchema, type Model, type Sheet, type UpdateSheetRequestInput } from '@channelwright/shared/schemas';
import { formatQuantity, parseQuantity } from '@channelwright/shared/units';

/** The settings form: text as typed (quantities with SI prefixes), read into a PATCH on save. */
export interface SettingsValues {
  name: string;
  description: string;
  processId: string;
  processVersion: string;
  corner: string;
  temperature: string;
  model: Model;
  leakageBudget: string;
  leakageTemperature: string;
  /** Offset budget text per match group. */
  offsetBudgets: Record<string, string>;
}

export function settingsOf(sheet: Sheet): SettingsValues {
  return {
    name: sheet.name,
    description: sheet.description,
    processId: sheet.process.profileId,
    processVersion: String(sheet.process.version),
    corner: sheet.corner,
    temperature: sheet.temperature === null ? '' : String(sheet.temperature),
    model: sheet.model,
    leakageBudget: sheet.leakageBudget ? formatQuantity(sheet.leakageBudget.current, 'A') : '',
    leakageTemperature: sheet.leakageBudget ? String(sheet.leakageBudget.temperature) : '',
    offsetBudgets: Object.fromEntries(sheet.totals.matchGroups.map((g) => [g.name, g.budget === null ? '' : formatQuantity(g.budget, 'V')])),
  };
}

export type SettingsErrors = Partial<Record<keyof SettingsValues | `offsetBudgets.${string}`, string>>;

/** The PATCH the form asks for (only what changed), or the errors by field; checked with the shared schema. */
export function settingsChange(sheet: Sheet, values: SettingsValues): { change: UpdateSheetRequestInput | null; errors: SettingsErrors } {
  const errors: SettingsErrors = {};
  const read = (field: keyof SettingsValues, text: string, unit: string): number | undefined => {
    const parsed = parseQuantity(text, unit);
    if (parsed.ok) return parsed.value;
    errors[field] = parsed.reason;
    return undefined;
  };
  const change: Record<string, unknown> = { version: sheet.version };
  if (values.name !== sheet.name) change.name = values.name;
  if (values.description !== sheet.description) change.description = values.description;
  if (values.processId !== sheet.process.profileId) {
    change.processId = values.processId;
    change.processVersion = Number(values.processVersion);
  } else if (Number(values.processVersion) !== sheet.process.version) change.processVersion = Number(values.processVersion);
  if (values.corner !== sheet.corner) change.corner = values.corner;
  const temperature = values.temperature.trim() === '' ? null : read('temperature', values.temperature, '°C');
  if (temperature !== undefined && temperature !== sheet.temperature) change.temperature = temperature;
  if (values.model !== sheet.model) change.model = values.model;
  if (values.leakageBudget.trim() === '') {
    if (sheet.leakageBudget) change.leakageBudget = null;
  } else {
    const current = read('leakageBudget', values.leakageBudget, 'A');
    const at = values.leakageTemperature.trim() === '' ? sheet.process.tnom : read('leakageTemperature', values.leakageTemperature, '°C');
    if (current !== undefined && at !== undefined && (current !== sheet.leakageBudget?.current || at !== sheet.leakageBudget?.temperature)) change.leakageBudget = { current, temperature: at };
  }
  const budgets = Object.entries(values.offsetBudgets).flatMap(([group, text]) => {
    if (text.trim() === '') return [];
    const parsed = parseQuantity(text, 'V');
    if (!parsed.ok) errors[`offsetBudgets.${group}`] = parsed.reason;
    return parsed.ok ? [{ group, sigmaVos: parsed.value }] : [];
  });
  const kept = sheet.offsetBudgets.filter((b) => !(b.group in values.offsetBudgets));
  const nextBudgets = [...kept, ...budgets];
  if (JSON.stringify(nextBudgets.toSorted((a, b) => a.group.localeCompare(b.group))) !== JSON.stringify(sheet.offsetBudgets.toSorted((a, b) => a.group.localeCompare(b.group)))) change.offsetBudgets = nextBudgets;
  if (Object.keys(errors).length > 0) return { change: null, errors };
  if (Object.keys(change).length === 1) return { change: null, errors: {} };
  const checked = updateSheetRequestSchema.safeParse(change);
  if (checked.success) return { change: change as UpdateSheetRequestInput, errors };
  for (const issue of checked.error.issues) {
    const field = fieldOfIssue(issue)?.replace(/^leakageBudget\.current$/, 'leakageBudget').replace(/^leakageBudget\.temperature$/, 'leakageTemperature') ?? 'name';
    errors[field as keyof SettingsErrors] ??= issue.message;
  }
  return { change: null, errors };
}
