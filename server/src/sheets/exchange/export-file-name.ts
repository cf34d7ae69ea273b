/** A file name of safe characters: "<project>-<sheet><suffix>", e.g. "Wrenmoss_sensor_front_end-Two-stage_amplifier.csv". */
export function exportFileName(projectName: string, sheetName: string, suffix: string): string {
  const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'sheet';
  return `${safe(projectName)}-${safe(sheetName)}${suffix}`;
}
