// Hand-written GraphML in the shape of published backbone topologies: every attribute a declared key, values as
// <data> elements, edges with or without ids. Names and places in the tests that use it are invented.
export type GraphmlNode = { id: string; data: Record<string, string | number> };
export type GraphmlEdge = { id?: string; source: string; target: string; data: Record<string, string | number> };

const escape = (v: string | number) => String(v).replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/"/g, '&quot;');

/** Keys declared for every attribute name used, typed double when all its values are numbers. */
function keys(items: { data: Record<string, string | number> }[], prefix: string, forWhat: string): Map<string, string> {
  const names = new Map<string, boolean>();
  for (const item of items) for (const [name, v] of Object.entries(item.data)) names.set(name, (names.get(name) ?? true) && typeof v === 'number');
  return new Map([...names.keys()].map((name, i) => [name, `${prefix}${i}`]).map(([name, id]) => [name, `${id}|${forWhat}|${names.get(name) ? 'double' : 'string'}`]));
}

export function graphmlText(nodes: GraphmlNode[], edges: GraphmlEdge[]): string {
  const nodeKeys = keys(nodes, 'd', 'node');
  const edgeKeys = keys(edges, 'e', 'edge');
  const decl = [...nodeKeys, ...edgeKeys].map(([name, spec]) => {
    const [id, forWhat, type] = spec.split('|');
    return `  <key attr.name="${escape(name)}" attr.type="${type}" for="${forWhat}" id="${id}" />`;
  });
  const data = (k: Map<string, string>, d: Record<string, string | number>) =>
    Object.entries(d).map(([name, v]) => `<data key="${k.get(name)!.split('|')[0]}">${escape(v)}</data>`).join('');
  return `<?xml version="1.0" encoding="utf-8"?>
<graphml xmlns="http://graphml.graphdrawing.org/xmlns" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://graphml.graphdrawing.org/xmlns http://graphml.graphdrawing.org/xmlns/1.0/graphml.xsd">
${decl.join('\n')}
  <graph edgedefault="undirected">
${nodes.map((n) => `    <node id="${escape(n.id)}">${data(nodeKeys, n.data)}</node>`).join('\n')}
${edges.map((e) => `    <edge ${e.id ? `id="${escape(e.id)}" ` : ''}source="${escape(e.source)}" target="${escape(e.target)}">${data(edgeKeys, e.data)}</edge>`).join('\n')}
  </graph>
</graphml>
`;
}
