export interface RawFile {
  title: string;
  names: string[];
  points: number;
  /** Point-major: the value of variable j at point i is values[i * names.length + j]. */
  values: Float64Array;
}
export function readRawFile(bytes: Uint8Array): RawFile;
export function canonicalVectorName(name: string): string;
