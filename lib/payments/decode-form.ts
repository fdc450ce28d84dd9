// Decodes the SDK's form bodies (`metadata[quoteId]=4`, `line_items[0][price_data][currency]=gbp`)
// into nested objects, for the local payment fake.
type Nested = { [key: string]: Nested | string };

export function decodeForm(body: string): Nested {
  const root: Nested = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.replace(/\]/g, '').split('[');
    let node = root;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = (node[part] ??= {}) as Nested;
    });
  }
  return root;
}

export function field(node: Nested | string | undefined, ...path: string[]): string | undefined {
  let current: Nested | string | undefined = node;
  for (const part of path) current = typeof current === 'object' ? current[part] : undefined;
  return typeof current === 'string' ? current : undefined;
}

export type { Nested };
