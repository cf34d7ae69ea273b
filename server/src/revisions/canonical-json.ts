/**
 * Canonical JSON after RFC 8785 (JSON Canonicalization Scheme, 2020): object members sorted by the
 * UTF-16 code units of their names, no whitespace, numbers and strings serialised as ECMAScript's
 * JSON.stringify does (which is what RFC 8785 §3.2.2 prescribes). Members whose value is undefined are
 * left out, as JSON.stringify does; a value JSON cannot carry (NaN, Infinity, a function, undefined in
 * an array, a bigint) throws, so two different values can never canonicalise to the same text.
 */
export function canonicalJson(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`canonicalJson: ${value} has no JSON form`);
      return JSON.stringify(value);
    case 'object':
      if (Array.isArray(value)) return `[${value.map((item) => canonicalArrayItem(item)).join(',')}]`;
      return canonicalObject(value as Record<string, unknown>);
    default:
      throw new TypeError(`canonicalJson: a ${typeof value} has no JSON form`);
  }
}

function canonicalArrayItem(item: unknown): string {
  if (item === undefined) throw new TypeError('canonicalJson: undefined in an array has no JSON form');
  return canonicalJson(item);
}

function canonicalObject(object: Record<string, unknown>): string {
  if (object instanceof Date) throw new TypeError('canonicalJson: give dates as ISO 8601 text, not Date objects');
  // The default sort compares UTF-16 code units, the order RFC 8785 §3.2.3 asks for.
  const names = Object.keys(object)
    .filter((name) => object[name] !== undefined)
    .sort();
  return `{${names.map((name) => `${JSON.stringify(name)}:${canonicalJson(object[name])}`).join(',')}}`;
}
