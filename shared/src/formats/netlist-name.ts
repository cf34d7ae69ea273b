/**
 * A name a SPICE netlist accepts as one token: letters, digits and underscores, starting with a letter
 * (SPICE reads a line as blank-separated fields and takes "+", "*", "." and "$" at a line's start or in a
 * field as syntax; ngspice manual, ch. 2, 2024). Everything else becomes "_", so "M1 copy" is "M1_copy";
 * an empty result or one that starts with a digit or "_" gets `prefix` in front.
 */
export function netlistName(text: string, prefix = 'n'): string {
  const safe = text.trim().normalize('NFKD').replace(/[\u0300-\u036f]/g, '').replace(/[^A-Za-z0-9_]+/g, '_');
  return /^[A-Za-z]/.test(safe) ? safe : `${prefix}${safe}`;
}

/**
 * Netlist names for a list of names, unique without regard to case (SPICE folds case): a name that would
 * repeat an earlier one gets _2, _3 … in the order given.
 */
export function uniqueNetlistNames(names: readonly string[], prefix = 'n'): string[] {
  const taken = new Set<string>();
  return names.map((name) => {
    const base = netlistName(name, prefix);
    let candidate = base;
    for (let i = 2; taken.has(candidate.toLowerCase()); i++) candidate = `${base}_${i}`;
    taken.add(candidate.toLowerCase());
    return candidate;
  });
}
