import type { MeasuredPoint } from '../extraction/measured-curves.js';
import type { Polarity } from '../schemas/process.js';

/** The header a written file has, by polarity: the NMOS's terminal names, the PMOS's positive (source-side) ones. */
const HEADERS: Record<Polarity, string> = {
  nmos: 'VGS [V],VDS [V],VSB [V],T [°C],W [um],L [um],NF,ID [A]',
  pmos: 'VSG [V],VSD [V],VBS [V],T [°C],W [um],L [um],NF,ISD [A]',
};

/** Nine significant digits, without the binary noise of a sum ("0.30000000000000004" → "0.3"). */
const cell = (value: number) => String(Number(value.toPrecision(9)));

/**
 * Writes polarity-normalised points (SI units, °C) as the CSV an upload is (docs/extraction.md, "The upload"), so
 * that readCurveFile reads them back as they are: "#" comment lines first (each line of `comments`), then the header
 * with its units and a row per point, W and L in µm. A PMOS's columns are named VSG, VSD, VBS and ISD (the positive
 * convention), so the file says what its numbers are.
 */
export function writeCurveFile(polarity: Polarity, points: readonly MeasuredPoint[], comments: readonly string[] = []): string {
  const lines = comments.map((comment) => `# ${comment.replace(/[\r\n]+/g, ' ')}`);
  lines.push(HEADERS[polarity]);
  for (const p of points) lines.push([p.vgs, p.vds, p.vsb, p.temperature, p.w * 1e6, p.l * 1e6, p.fingers ?? 1, p.id].map(cell).join(','));
  return `${lines.join('\n')}\n`;
}
