// The guides say what the code is: every file path they name exists, every `npm run` names a script, and every
// `npx jest …` command they give selects exactly the tests it claims to (jest --listTests, without running them).
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const GUIDES = ['README.md', 'DEVELOPERS.md', ...readdirSync(path.join(root, 'docs')).filter((f) => f.endsWith('.md')).map((f) => `docs/${f}`)];
const TOP = ['app', 'bench', 'components', 'constants', 'db', 'docs', 'hooks', 'planner', 'scenarios', 'scripts', 'server', 'shared', 'tests'];

/** Every `code span` of every guide, with the guide it came from. */
function codeSpans(): { guide: string; span: string }[] {
  return GUIDES.flatMap((guide) => {
    const text = readFileSync(path.join(root, guide), 'utf8').replace(/```[\s\S]*?```/g, '');
    return [...text.matchAll(/`([^`\n]+)`/g)].map((m) => ({ guide, span: m[1] }));
  });
}

/** Repository paths named in a span: `server/routes/windows.ts`, `tests/e2e/`, `app/(main)/notices/` … */
function pathsIn(span: string): string[] {
  return span.split(/[\s,]+/)
    .map((w) => w.replace(/^[("']+|[)"'.;:]+$/g, '').replace(/:\d+$/, ''))
    .filter((w) => TOP.some((top) => w.startsWith(`${top}/`)))
    .filter((w) => !/[*<>{}$]|…/.test(w));
}

describe('guides name only what exists', () => {
  const spans = codeSpans();

  it('every repository path in a guide exists', () => {
    const missing = spans.flatMap(({ guide, span }) => pathsIn(span).filter((p) => !existsSync(path.join(root, p))).map((p) => `${guide}: ${p}`));
    expect(missing).toEqual([]);
  });

  it('every `npm run NAME` in a guide is a package.json script', () => {
    const scripts = Object.keys(JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')).scripts as object);
    const named = spans.flatMap(({ guide, span }) => [...span.matchAll(/npm run ([\w:-]+)/g)].map((m) => ({ guide, name: m[1] })));
    expect(named.length).toBeGreaterThan(0);
    expect(named.filter(({ name }) => !scripts.includes(name)).map(({ guide, name }) => `${guide}: ${name}`)).toEqual([]);
  });
});

/** The jest arguments of every `npx jest …` command in the guides (placeholders excluded). */
function jestCommands(): { guide: string; args: string[] }[] {
  return codeSpans()
    .map(({ guide, span }) => ({ guide, m: span.match(/npx jest ([^&|;<>`]+)$/) }))
    .filter((c): c is { guide: string; m: RegExpMatchArray } => c.m !== null)
    .map(({ guide, m }) => ({ guide, args: m[1].trim().split(/\s+/) }));
}

function listTests(args: string[]): string[] {
  const jestBin = require.resolve('jest/bin/jest');
  const out = execFileSync(process.execPath, [jestBin, '--listTests', ...args], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
  // stdout also carries "Running one project: …"; the tests are the absolute paths.
  return out.toString().split('\n').filter((l) => l.startsWith(root)).map((f) => path.relative(root, f));
}

describe('every jest command in the guides selects what it says', () => {
  const commands = jestCommands();

  it('the guides give jest commands', () => {
    expect(commands.length).toBeGreaterThan(3);
  });

  it.each(commands.map((c) => [c.guide, c.args.join(' '), c.args] as const))('%s: npx jest %s', (_guide, _line, args) => {
    const listed = listTests(args);
    expect(listed.length).toBeGreaterThan(0);
    // Paths in the command narrow the run: every listed test lies under one of them (a path read as a project
    // name, e.g. after --selectProjects, would list the whole project instead).
    const paths = args.filter((a, i) => !a.startsWith('-') && !(args[i - 1] ?? '').startsWith('--select') && TOP.some((t) => a.startsWith(`${t}/`)));
    const outside = paths.length === 0 ? [] : listed.filter((file) => !paths.some((p) => file.startsWith(p)));
    expect(outside).toEqual([]);
  });
});
