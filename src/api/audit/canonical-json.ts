/**
 * A canonical JSON text of plain data, the same for equal data on every run and machine: object keys
 * in ascending UTF-16 code-unit order, no whitespace, numbers as ECMAScript writes them (the shortest
 * text that reads back to the same double, so fixed across engines), -0 as 0, keys whose value is
 * undefined left out, arrays (and typed arrays) in order, a Map as an object of its entries. NaN,
 * Infinity, functions and other values that are not data are refused: they have no canonical form.
 *
 * canonicalJson({ b: 1, a: [2, -0] }) -> '{"a":[2,0],"b":1}'
 */

export function canonicalJson(value: unknown): string {
  const out: string[] = [];
  write(value, out);
  return out.join('');
}

function write(value: unknown, out: string[]): void {
  if (value === null) {
    out.push('null');
    return;
  }
  switch (typeof value) {
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`${value} has no canonical JSON form`);
      out.push(Object.is(value, -0) ? '0' : String(value));
      return;
    case 'string':
      out.push(JSON.stringify(value));
      return;
    case 'boolean':
      out.push(value ? 'true' : 'false');
      return;
    case 'object':
      break;
    default:
      throw new TypeError(`a ${typeof value} has no canonical JSON form`);
  }
  if (Array.isArray(value) || ArrayBuffer.isView(value)) {
    out.push('[');
    const items = value as ArrayLike<unknown>;
    for (let i = 0; i < items.length; i++) {
      if (i > 0) out.push(',');
      write(items[i], out);
    }
    out.push(']');
    return;
  }
  const entries = value instanceof Map ? [...value.entries()].map(([key, item]) => [String(key), item] as const) : Object.entries(value as Record<string, unknown>);
  const present = entries.filter(([, item]) => item !== undefined).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  out.push('{');
  present.forEach(([key, item], i) => {
    if (i > 0) out.push(',');
    out.push(JSON.stringify(key), ':');
    write(item, out);
  });
  out.push('}');
}
