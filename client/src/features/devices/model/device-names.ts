/** The first of "M1", "M2", … not yet taken: the name a new device gets. */
export function nextDeviceName(taken: Iterable<string>): string {
  const names = new Set(taken);
  for (let n = 1; ; n++) if (!names.has(`M${n}`)) return `M${n}`;
}

/** A duplicate's name: "M3 copy", then "M3 copy 2", … whichever is free. */
export function copyName(name: string, taken: Iterable<string>): string {
  const names = new Set(taken);
  const base = `${name} copy`.slice(0, 50);
  if (!names.has(base)) return base;
  for (let n = 2; ; n++) if (!names.has(`${base} ${n}`)) return `${base} ${n}`;
}
