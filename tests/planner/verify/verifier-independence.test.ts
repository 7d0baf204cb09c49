// The verifier keeps its own capacity, load, tolerance and anchor code: it must never reach the planner's, or a
// bug there would pass both the planner and its check. This reads the sources, so the rule cannot regress silently.
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(__dirname, '../../..');
const verifyDir = path.join(root, 'planner/verify');

/** The planner's own accounting that the verifier re-implements. */
const FORBIDDEN = ['planner/model/window-capacity.ts', 'planner/model/tolerance.ts', 'planner/model/anchor.ts', 'planner/geo/great-circle.ts'];
/** All the verifier may load outside its own folder: types and plain id → index resolution. */
const ALLOWED_OUTSIDE = ['planner/errors.ts', 'planner/model/types.ts', 'planner/model/window-elements.ts'];

/** Relative module specifiers of static imports, re-exports, dynamic imports and requires. */
function relativeImports(source: string): string[] {
  const found = [...source.matchAll(/(?:\bfrom\s*|\bimport\s*\(?\s*|\brequire\s*\(\s*)['"]([^'"]+)['"]/g)].map((m) => m[1]);
  return found.filter((spec) => spec.startsWith('.'));
}

function resolveModule(fromFile: string, spec: string): string {
  const base = path.resolve(path.dirname(fromFile), spec);
  const hit = [`${base}.ts`, `${base}.tsx`, path.join(base, 'index.ts'), base].find((f) => fs.existsSync(f) && fs.statSync(f).isFile());
  if (hit === undefined) throw new Error(`cannot resolve "${spec}" from ${path.relative(root, fromFile)}`);
  return path.relative(root, hit).split(path.sep).join('/');
}

/** Every repository file the verifier loads, directly or through other files, each with who imports it. */
function reachable(): Map<string, string> {
  const start = fs.readdirSync(verifyDir).filter((f) => f.endsWith('.ts')).map((f) => `planner/verify/${f}`);
  const seen = new Map<string, string>(start.map((f) => [f, '(verifier)']));
  const queue = [...start];
  while (queue.length > 0) {
    const file = queue.shift()!;
    const abs = path.join(root, file);
    for (const spec of relativeImports(fs.readFileSync(abs, 'utf8'))) {
      const target = resolveModule(abs, spec);
      if (!seen.has(target)) {
        seen.set(target, file);
        queue.push(target);
      }
    }
  }
  return seen;
}

describe('verifier independence', () => {
  const files = reachable();

  it('finds the verifier sources and their imports', () => {
    expect(files.has('planner/verify/verify-plan.ts')).toBe(true);
    expect(files.has('planner/model/types.ts')).toBe(true);
  });

  it('never reaches the planner window-capacity, tolerance, anchor or great-circle code, even indirectly', () => {
    const hits = FORBIDDEN.filter((f) => files.has(f)).map((f) => `${f} (imported by ${files.get(f)})`);
    expect(hits).toEqual([]);
  });

  it('loads nothing outside planner/verify but types, window elements and errors', () => {
    const outside = [...files.keys()].filter((f) => !f.startsWith('planner/verify/')).sort();
    expect(outside.filter((f) => !ALLOWED_OUTSIDE.includes(f))).toEqual([]);
  });

  it('spots a forbidden import when one is written', () => {
    const source = "import { fits } from '../model/tolerance';\nexport { satisfiesAnchor } from \"../model/anchor\";\n";
    const targets = relativeImports(source).map((spec) => resolveModule(path.join(verifyDir, 'x.ts'), spec));
    expect(targets).toEqual(['planner/model/tolerance.ts', 'planner/model/anchor.ts']);
  });
});
