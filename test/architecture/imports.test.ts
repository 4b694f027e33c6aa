/**
 * The folder structure the architecture promises (architecture.md): `rules/` never imports
 * `app/`, and the folders of `rules/` depend on each other without a cycle, so that each layer
 * (levels → model → profiles → engine → checks → report → cli) can be read, tested and
 * bundled on its own. Imports are read from the source text (type-only imports count too: a
 * type still ties the folders together).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));

function sources(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(join(root, dir))) {
    const path = join(dir, name);
    if (statSync(join(root, path)).isDirectory()) out.push(...sources(path));
    else if (/\.(ts|tsx|mjs)$/.test(name)) out.push(path);
  }
  return out;
}

const IMPORT = /(?:^|\n)\s*(?:import|export)\b[^;'"]*?\bfrom\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g;

/** Every relative import of a file, as a path from the repository's root. */
function importsOf(file: string, text: string): string[] {
  const out: string[] = [];
  for (const m of text.matchAll(IMPORT)) {
    const spec = m[1] ?? m[2]!;
    if (spec.startsWith('.')) out.push(normalize(join(dirname(file), spec)));
  }
  return out;
}

/** The folder of `rules/` a path is in (`rules/engine`), or the path's top folder elsewhere. */
const folderOf = (path: string) =>
  path
    .split('/')
    .slice(0, path.startsWith('rules/') ? 2 : 1)
    .join('/');

function folderGraph(files: readonly string[]): Map<string, Map<string, string>> {
  const graph = new Map<string, Map<string, string>>();
  for (const file of files) {
    const from = folderOf(file);
    for (const target of importsOf(file, readFileSync(join(root, file), 'utf8'))) {
      const to = folderOf(target);
      if (to === from || !to.startsWith('rules/')) continue;
      if (!graph.has(from)) graph.set(from, new Map());
      if (!graph.get(from)!.has(to)) graph.get(from)!.set(to, `${file} → ${relative(root, join(root, target))}`);
    }
  }
  return graph;
}

/** Each cycle once, as its folders in order and the import that closes each step. */
function cycles(graph: Map<string, Map<string, string>>): string[] {
  const found = new Set<string>();
  const out: string[] = [];
  const walk = (start: string, at: string, path: string[], why: string[]) => {
    for (const [next, because] of graph.get(at) ?? []) {
      if (next === start) {
        const key = [...path].sort().join(' ');
        if (!found.has(key)) {
          found.add(key);
          out.push(`${[...path, start].join(' → ')} (${[...why, because].join('; ')})`);
        }
      } else if (!path.includes(next) && next > start) walk(start, next, [...path, next], [...why, because]);
    }
  };
  for (const start of [...graph.keys()].sort()) walk(start, start, [start], []);
  return out;
}

const rulesFiles = sources('rules');

describe('the folder structure', () => {
  it('rules/ never imports app/', () => {
    const offending = rulesFiles.flatMap((f) =>
      importsOf(f, readFileSync(join(root, f), 'utf8'))
        .filter((t) => t.startsWith('app/'))
        .map((t) => `${f} → ${t}`),
    );
    expect(offending).toEqual([]);
  });

  it('the folders of rules/ import each other without a cycle', () => {
    // Named here while it is being taken apart: rules implement the engine's contract, and the
    // engine's entry point runs the registry of rules. A new cycle fails this test.
    const known: string[] = [];
    const found = cycles(folderGraph(rulesFiles)).filter((c) => !known.some((k) => c.startsWith(`${k} (`)));
    expect(found).toEqual([]);
  });

  it('the cycle finder finds a planted cycle and the import behind it', () => {
    const planted = new Map([
      ['rules/a', new Map([['rules/b', 'a.ts → b.ts']])],
      ['rules/b', new Map([['rules/c', 'b.ts → c.ts']])],
      ['rules/c', new Map([['rules/a', 'c.ts → a.ts']])],
    ]);
    expect(cycles(planted)).toEqual(['rules/a → rules/b → rules/c → rules/a (a.ts → b.ts; b.ts → c.ts; c.ts → a.ts)']);
  });

  it('reads static, re-export and dynamic imports', () => {
    const text =
      "import { a } from './x.ts';\nexport { b } from '../y/z.ts';\nconst m = await import('../../app/w.ts');\nimport type { T } from './t.ts';";
    expect(importsOf('rules/engine/f.ts', text).sort()).toEqual([
      'app/w.ts',
      'rules/engine/t.ts',
      'rules/engine/x.ts',
      'rules/y/z.ts',
    ]);
  });
});

/**
 * What the format says once, said once: each of these defaults or derivations has one home in
 * rules/model/ that the engine, the report and the editor import. A copy elsewhere drifts (the
 * canvas once drew a bidir pin's default drive differently from the engine's).
 */
const SAID_ONCE: readonly { what: string; home: string; pattern: RegExp }[] = [
  {
    what: "a pin's default drive",
    home: 'rules/model/pinDefaults.ts',
    pattern: /'three-state'\s*:\s*'push-pull'|'push-pull'\s*:\s*'three-state'/,
  },
  { what: "a pin's default side", home: 'rules/model/pinDefaults.ts', pattern: /'input'\s*\?\s*'left'\s*:\s*'right'/ },
  {
    what: "a pin's rail from its part",
    home: 'rules/model/pinDefaults.ts',
    pattern: /\bpin\.rail\s*\?\?\s*[\w.]*part\.rail\b/,
  },
  {
    what: "a pin's profile from its part",
    home: 'rules/model/pinDefaults.ts',
    pattern: /\bpin\.profile\s*\?\?\s*[\w.]*part\.profile\b/,
  },
  {
    what: "a net's wires from its route",
    home: 'rules/model/wiring.ts',
    pattern: /for \(const \[a, b\] of net\.route \?\? \[\]\)/,
  },
  {
    what: 'a profile looked up by id',
    home: 'rules/profiles/index.ts',
    pattern: /profiles\?\.find\(\(p\) => p\.id === id\)\s*\?\?/,
  },
];

describe('shared model helpers', () => {
  const files = [...rulesFiles, ...sources('app')];
  it.each(SAID_ONCE)('$what lives in $home only', ({ home, pattern }) => {
    const at = files.filter((f) => pattern.test(readFileSync(join(root, f), 'utf8')));
    expect(at).toEqual([home]);
  });

  it('a planted copy is found', () => {
    const planted = "const drive = pin.drive ?? (pin.role === 'output' ? 'push-pull' : 'three-state');";
    expect(SAID_ONCE[0]!.pattern.test(planted)).toBe(true);
  });
});

/** The modules of rules/ the editor may import: each folder's index, and the PDF writer's (loaded on export). */
const isIndexModule = (path: string) => /^rules\/[a-z]+\/index\.ts$/.test(path) || path === 'rules/report/pdf/index.ts';

describe('the editor and the engine', () => {
  it('app/ imports rules/ only through the folders\u2019 index modules', () => {
    const offending = sources('app').flatMap((f) =>
      importsOf(f, readFileSync(join(root, f), 'utf8'))
        .filter((t) => t.startsWith('rules/') && !isIndexModule(t))
        .map((t) => `${f} → ${t}`),
    );
    expect(offending).toEqual([]);
  });

  it('a planted deep import is found', () => {
    const text =
      "import { check } from '../../rules/check/check.ts';\nimport { RULES } from '../../rules/checks/index.ts';";
    const deep = importsOf('app/panels/X.tsx', text).filter((t) => t.startsWith('rules/') && !isIndexModule(t));
    expect(deep).toEqual(['rules/check/check.ts']);
  });
});
