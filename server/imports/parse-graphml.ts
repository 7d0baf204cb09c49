// Reads a GraphML topology: nodes → sites, edges → spans (values per graphml-keys.ts and the upload's mapping;
// merge fills or reports gaps).
import Graph from 'graphology';
import { parse as parseGraphml } from 'graphology-graphml';
import type { ImportIssue, ImportMapping } from '../../shared/imports';
import { ImportFileError } from './errors';
import { siteValues, spanValues, type Recognised } from './graphml-keys';
import type { GraphmlNames, GraphmlSite, GraphmlSpan, ParsedImport } from './types';
import { parseXmlStrict } from './xml-check';

/** Duplicate node or edge ids and edges to unknown nodes: the library would merge or throw on them. */
function structureErrors(doc: Document, fileName: string): { errors: ImportIssue[]; edgeIds: Set<string> } {
  const errors: ImportIssue[] = [];
  const nodeIds = new Set<string>();
  const edgeIds = new Set<string>();
  const nodes = doc.getElementsByTagName('node');
  for (let i = 0; i < nodes.length; i++) {
    const id = nodes[i].getAttribute('id') ?? '';
    if (id === '') errors.push({ file: fileName, path: `node #${i + 1}`, message: 'node without an id' });
    else if (nodeIds.has(id)) errors.push({ file: fileName, path: `node[${id}]`, message: `duplicate node id "${id}"` });
    nodeIds.add(id);
  }
  const edges = doc.getElementsByTagName('edge');
  for (let i = 0; i < edges.length; i++) {
    const id = edges[i].getAttribute('id') ?? '';
    const at = id ? `edge[${id}]` : `edge #${i + 1}`;
    if (id && edgeIds.has(id)) errors.push({ file: fileName, path: at, message: `duplicate edge id "${id}"` });
    if (id) edgeIds.add(id);
    for (const end of ['source', 'target']) {
      const node = edges[i].getAttribute(end) ?? '';
      if (!nodeIds.has(node)) errors.push({ file: fileName, path: at, message: `${end} "${node}" is not a node of the file` });
    }
  }
  return { errors, edgeIds };
}

/** Spans need ids; an edge without one is named after its ends (and a number when parallel). */
function edgeId(given: Set<string>, used: Set<string>, key: string, source: string, target: string): string {
  if (given.has(key)) return key;
  const base = `${source}-${target}`;
  let id = base;
  for (let n = 2; used.has(id) || given.has(id); n++) id = `${base}-${n}`;
  return id;
}

/** Attribute names as the file spells them, in order of first use. */
function attributeNames(all: Record<string, unknown>[]): string[] {
  const seen = new Set<string>();
  for (const attrs of all) for (const name of Object.keys(attrs)) seen.add(name);
  return [...seen];
}

/** A mapping may only name attributes the file has (case-insensitively, as our own names are matched). */
function checkMapping(mapping: ImportMapping | undefined, attributes: GraphmlNames['attributes']): void {
  for (const entity of ['site', 'span'] as const) {
    const known = new Set(attributes[entity].map((a) => a.toLowerCase()));
    for (const [field, attr] of Object.entries(mapping?.[entity] ?? {})) {
      if (attr !== undefined && !known.has(attr.toLowerCase())) {
        const where = entity === 'site' ? 'nodes' : 'edges';
        throw new ImportFileError('BAD_MAPPING', `mapping ${entity}.${field}: the file's ${where} have no attribute "${attr}".`);
      }
    }
  }
}

const noNames = (): GraphmlNames => ({ attributes: { site: [], span: [] }, recognised: { site: {}, span: {} } });

export function parseGraphmlFile(text: string, fileName: string, options: { mapping?: ImportMapping } = {}): ParsedImport {
  const { mapping } = options;
  const doc = parseXmlStrict(text, fileName);
  const { errors, edgeIds } = structureErrors(doc, fileName);
  const warnings: ImportIssue[] = [];
  if (errors.length > 0) return { errors, warnings, content: { kind: 'graphml', sites: [], spans: [], names: noNames() } };
  let graph: Graph;
  try {
    graph = parseGraphml(Graph, text);
  } catch (err) {
    throw new ImportFileError('BAD_GRAPHML', `"${fileName}" could not be read as GraphML: ${(err as Error).message}`);
  }
  const names = noNames();
  names.attributes.site = attributeNames(graph.mapNodes((_id, attrs) => attrs));
  names.attributes.span = attributeNames(graph.mapEdges((_key, attrs) => attrs));
  checkMapping(mapping, names.attributes);
  const siteFrom: Recognised = names.recognised.site;
  const spanFrom: Recognised = names.recognised.span;
  const sites: GraphmlSite[] = graph.mapNodes((id, attrs) => {
    const problem = (message: string) => errors.push({ file: fileName, path: `node[${id}]`, message });
    return { id, given: siteValues(attrs, problem, mapping?.site, siteFrom) };
  });
  const used = new Set<string>();
  const spans: GraphmlSpan[] = graph.mapEdges((key, attrs, source, target) => {
    const id = edgeId(edgeIds, used, key, source, target);
    used.add(id);
    if (!edgeIds.has(key)) warnings.push({ file: fileName, path: `edge[${id}]`, message: `edge ${source}–${target} has no id; named "${id}"` });
    const problem = (message: string) => errors.push({ file: fileName, path: `edge[${id}]`, message });
    return { id, given: { ...spanValues(attrs, problem, mapping?.span, spanFrom), a: source, b: target } };
  });
  return { errors, warnings, content: { kind: 'graphml', sites, spans, names } };
}
