/**
 * The built client's weight: the JavaScript a first visit loads (the entry script and its
 * modulepreloads, read from dist/index.html) and each lazily loaded chunk, gzipped with zlib.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { root } from './server-process';

/** Marks the map's tree layer sets; a build without it predates the draw signal. */
export const DRAW_MARK = 'clearwood:trees-drawn';

const newest = (dir: string): number =>
  fs
    .readdirSync(dir, { withFileTypes: true })
    .reduce(
      (m, e) =>
        Math.max(
          m,
          e.isDirectory()
            ? newest(path.join(dir, e.name))
            : fs.statSync(path.join(dir, e.name)).mtimeMs,
        ),
      0,
    );

/** Builds the client when dist/ is missing, older than the sources, or lacks the draw signal. */
export function ensureClientBuilt(): { built: boolean; seconds: number } {
  const index = path.join(root, 'dist', 'index.html');
  const assets = path.join(root, 'dist', 'assets');
  const sources = ['src', 'shared', 'public'].map((d) => newest(path.join(root, d)));
  const configs = ['index.html', 'vite.config.ts', 'tailwind.config.ts', 'package-lock.json'].map(
    (f) => fs.statSync(path.join(root, f)).mtimeMs,
  );
  const stale =
    !fs.existsSync(index) ||
    Math.max(...sources, ...configs) > fs.statSync(index).mtimeMs ||
    !fs.existsSync(assets) ||
    !fs
      .readdirSync(assets)
      .some(
        (f) =>
          f.endsWith('.js') && fs.readFileSync(path.join(assets, f), 'utf8').includes(DRAW_MARK),
      );
  if (!stale) return { built: false, seconds: 0 };
  const t0 = Date.now();
  const vite = path.join(root, 'node_modules', 'vite', 'bin', 'vite.js');
  const built = spawnSync(process.execPath, [vite, 'build', '--logLevel', 'error'], {
    cwd: root,
    encoding: 'utf8',
    timeout: 180_000,
  });
  if (built.status !== 0) {
    process.stderr.write(`${built.stdout ?? ''}${built.stderr ?? ''}`);
    throw new Error('vite build failed');
  }
  return { built: true, seconds: (Date.now() - t0) / 1000 };
}

export interface Chunk {
  file: string;
  bytes: number;
  gzip: number;
}

export interface BundleFigures {
  initial: Chunk[];
  initialGzip: number;
  initialCss: Chunk[];
  /** Each lazy chunk, and what it pulls in beyond the initial set (itself included). */
  lazy: (Chunk & { withImportsGzip: number })[];
}

const gzipOf = (file: string) => zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;

export function bundleFigures(): BundleFigures {
  const dist = path.join(root, 'dist');
  const html = fs.readFileSync(path.join(dist, 'index.html'), 'utf8');
  const attr = (tag: string, name: string) => new RegExp(`${name}="([^"]+)"`).exec(tag)?.[1];
  const tags = html.match(/<(script|link)\b[^>]*>/g) ?? [];
  const initialJs = new Set<string>();
  const initialCss = new Set<string>();
  for (const tag of tags) {
    if (tag.startsWith('<script') && /type="module"/.test(tag) && attr(tag, 'src'))
      initialJs.add(attr(tag, 'src')!.replace(/^\//, ''));
    if (tag.startsWith('<link') && /rel="modulepreload"/.test(tag))
      initialJs.add(attr(tag, 'href')!.replace(/^\//, ''));
    if (tag.startsWith('<link') && /rel="stylesheet"/.test(tag))
      initialCss.add(attr(tag, 'href')!.replace(/^\//, ''));
  }
  const chunk = (rel: string): Chunk => {
    const file = path.join(dist, rel);
    return { file: rel, bytes: fs.statSync(file).size, gzip: gzipOf(file) };
  };
  // What a chunk imports statically: Vite writes `from"./x.js"` and `import"./x.js"`.
  const assets = path.join(dist, 'assets');
  const importsOf = new Map<string, string[]>();
  for (const f of fs.readdirSync(assets).filter((f) => f.endsWith('.js'))) {
    const text = fs.readFileSync(path.join(assets, f), 'utf8');
    const deps = [...text.matchAll(/(?:from|import)\s*"\.\/([\w.-]+\.js)"/g)].map(
      (m) => `assets/${m[1]}`,
    );
    importsOf.set(`assets/${f}`, deps);
  }
  const closure = (start: string) => {
    const seen = new Set<string>();
    const walk = (f: string) => {
      if (seen.has(f) || initialJs.has(f)) return;
      seen.add(f);
      for (const d of importsOf.get(f) ?? []) walk(d);
    };
    walk(start);
    return seen;
  };
  // The entry's own static imports belong to the first visit too.
  for (const f of [...initialJs]) for (const d of importsOf.get(f) ?? []) initialJs.add(d);

  const sizes = new Map([...importsOf.keys()].map((f) => [f, chunk(f)]));
  const initial = [...initialJs].map((f) => sizes.get(f) ?? chunk(f));
  const lazy = [...sizes.values()]
    .filter((c) => !initialJs.has(c.file))
    .map((c) => ({
      ...c,
      withImportsGzip: [...closure(c.file)].reduce((n, f) => n + (sizes.get(f)?.gzip ?? 0), 0),
    }))
    .sort((a, b) => b.gzip - a.gzip);
  return {
    initial,
    initialGzip: initial.reduce((n, c) => n + c.gzip, 0),
    initialCss: [...initialCss].map(chunk),
    lazy,
  };
}
