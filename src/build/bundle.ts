/**
 * Bundles the compiled modules (dist/src) into the two files `headroom` runs through
 * src/cli/launch.cts: dist/bundle/cli.cjs (every command, without the interactive screens) and
 * dist/bundle/app.cjs (everything, for `headroom` alone). Then runs one `pick` on the demo catalog
 * so the launcher leaves a V8 code cache beside cli.cjs; app.cjs gets its cache on its first
 * interactive run.
 * Why: a cold Node 20 start spends most of its time resolving, reading and compiling hundreds of
 * small modules (Ink, React, zod and our own layers); one CommonJS file per path, compiled from a
 * code cache, starts several times faster (bench/README.md, start-up). CommonJS because only
 * vm.Script takes a code cache on Node 20. Build tooling only: nothing in the core imports it.
 */
import { build, type BuildOptions, type Plugin } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { chmodSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import Module from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { packageRoot } from '../catalog/package-root.js';

const root = packageRoot();
const dist = join(root, 'dist');
const outdir = join(dist, 'bundle');
const yogaDist = join(root, 'node_modules', 'yoga-layout', 'dist');
rmSync(outdir, { recursive: true, force: true });

/**
 * zod re-exports every message locale (about 280 KB of the 570 KB it adds) through a namespace the
 * bundler cannot prune. Headroom words its own messages and zod uses English by default, so the
 * bundle keeps English alone; `z.locales` then holds only `en`. Also left out: z.fromJSONSchema.
 */
const zodEnglishOnly: Plugin = {
  name: 'zod-english-only',
  setup(b) {
    b.onResolve({ filter: /\/locales\/index\.js$/ }, (args) => (args.importer.includes(join('node_modules', 'zod')) ? { path: 'zod-locales', namespace: 'headroom' } : undefined));
    b.onLoad({ filter: /^zod-locales$/, namespace: 'headroom' }, () => ({ contents: "export { default as en } from 'zod/v4/locales/en.js';", resolveDir: root }));
    // z.fromJSONSchema (unused here) spreads zod's whole namespace into a table as it loads.
    b.onResolve({ filter: /\/from-json-schema\.js$/ }, (args) => (args.importer.includes(join('node_modules', 'zod')) ? { path: 'zod-from-json-schema', namespace: 'headroom' } : undefined));
    b.onLoad({ filter: /^zod-from-json-schema$/, namespace: 'headroom' }, () => ({
      contents: "export function fromJSONSchema() { throw new Error('z.fromJSONSchema is not part of the Headroom bundle'); }",
    }));
  },
};

/** The command-line bundle leaves the screens out: the launcher sends screen starts to app.cjs. */
const withoutScreens: Plugin = {
  name: 'without-screens',
  setup(b) {
    b.onResolve({ filter: /\/tui\/start-tui\.js$/ }, () => ({ path: 'start-tui', namespace: 'headroom' }));
    b.onLoad({ filter: /^start-tui$/, namespace: 'headroom' }, () => ({
      contents: "export const startTui = () => { throw new Error('the interactive screens are in app.cjs; start headroom through dist/src/cli/launch.cjs'); };",
    }));
  },
};

/**
 * Ink's layout engine (yoga-layout 3) awaits its WebAssembly at the top of its module, which only
 * an ES module may do. Here it loads the same WebAssembly and wrapper, and the screens' entry
 * waits for it before the first render; Ink reaches Yoga only while rendering. Ink's own top-level
 * awaits serve its React devtools (DEV=true only), which the bundle leaves out.
 */
const inkAsCommonJs: Plugin = {
  name: 'ink-as-commonjs',
  setup(b) {
    b.onResolve({ filter: /^yoga-layout$/ }, () => ({ path: 'yoga', namespace: 'headroom' }));
    b.onLoad({ filter: /^yoga$/, namespace: 'headroom' }, () => ({
      resolveDir: root,
      contents: `import loadYoga from ${JSON.stringify(join(yogaDist, 'binaries', 'yoga-wasm-base64-esm.js'))};
import wrapAssembly from ${JSON.stringify(join(yogaDist, 'src', 'wrapAssembly.js'))};
export * from ${JSON.stringify(join(yogaDist, 'src', 'generated', 'YGEnums.js'))};
let yoga;
globalThis.__headroomYogaReady = loadYoga().then((lib) => { yoga = wrapAssembly(lib); });
export default new Proxy({}, { get: (_, key) => yoga[key] });`,
    }));
    // The screens wait for the layout engine before their first render.
    b.onResolve({ filter: /\/tui\/start-tui\.js$/ }, (args) => (args.namespace === 'headroom' ? undefined : { path: 'start-tui', namespace: 'headroom', pluginData: join(args.resolveDir, args.path) }));
    b.onLoad({ filter: /^start-tui$/, namespace: 'headroom' }, (args) => ({
      resolveDir: root,
      contents: `import { startTui as start } from ${JSON.stringify(args.pluginData)};
export async function startTui(options) { await globalThis.__headroomYogaReady; return start(options); }`,
    }));
    b.onLoad({ filter: /[\\/]ink[\\/]build[\\/]reconciler\.js$/ }, (args) => {
      const text = readFileSync(args.path, 'utf8');
      const devtools = "await import('./devtools.js');";
      const packageJson = '? await loadPackageJson()';
      // Pinned Ink version: if its source moves, fail the build rather than ship a guess.
      if (!text.includes(devtools) || !text.includes(packageJson)) throw new Error(`ink-as-commonjs: ${args.path} changed; review this plugin`);
      return { contents: text.replace(devtools, 'void 0;').replace(packageJson, '? {}'), loader: 'js', resolveDir: dirname(args.path) };
    });
  },
};

/**
 * Ink measures every piece of text with string-width and slices it with slice-ansi; both build an
 * Intl.Segmenter and Unicode-property regular expressions as they load (ICU data: tens of
 * milliseconds before the first screen). Here string-width's body is set up on first need, text
 * that isNarrowText accepts once its escape codes are stripped (all of Headroom's own screens) is
 * measured by its length, which string-width would answer too (tests/build), and slice-ansi makes
 * its segmenter on first use.
 */
const quickTextWidth: Plugin = {
  name: 'quick-text-width',
  setup(b) {
    b.onLoad({ filter: /[\\/]string-width[\\/]index\.js$/ }, (args) => {
      const text = readFileSync(args.path, 'utf8');
      const lines = text.split('\n');
      const body = lines.findIndex((line) => line.trim() !== '' && !line.startsWith('import '));
      const entry = 'export default function stringWidth(';
      // Pinned versions: if their source moves, fail the build rather than ship a guess.
      if (!text.includes(entry) || !text.includes("import stripAnsi from 'strip-ansi';") || text.split('export ').length !== 2) {
        throw new Error(`quick-text-width: ${args.path} changed; review this plugin`);
      }
      return {
        contents: `${lines.slice(0, body).join('\n')}
import { isNarrowText } from ${JSON.stringify(join(dist, 'src', 'build', 'narrow-text.js'))};
function setUp() {
${lines.slice(body).join('\n').replace(entry, 'function fullStringWidth(')}
return fullStringWidth;
}
let full;
export default function stringWidth(string, options) {
  if (typeof string === 'string' && !options?.countAnsiEscapeCodes) {
    const plain = string.includes('\\u001b') ? stripAnsi(string) : string;
    if (isNarrowText(plain)) return plain.length;
  }
  return (full ??= setUp())(string, options);
}`,
        loader: 'js',
        resolveDir: dirname(args.path),
      };
    });
    b.onLoad({ filter: /[\\/]slice-ansi[\\/]tokenize-ansi\.js$/ }, (args) => {
      const text = readFileSync(args.path, 'utf8');
      const eager = "const GRAPHEME_SEGMENTER = new Intl.Segmenter(undefined, {granularity: 'grapheme'});";
      if (!text.includes(eager)) throw new Error(`quick-text-width: ${args.path} changed; review this plugin`);
      const lazy = "let graphemeSegmenter; const GRAPHEME_SEGMENTER = { segment: (s) => (graphemeSegmenter ??= new Intl.Segmenter(undefined, {granularity: 'grapheme'})).segment(s) };";
      return { contents: text.replace(eager, lazy), loader: 'js', resolveDir: dirname(args.path) };
    });
    // Ink tokenises every styled line it writes, grapheme by grapheme.
    b.onLoad({ filter: /[\\/]@alcalzone[\\/]ansi-tokenize[\\/]build[\\/]tokenize\.js$/ }, (args) => {
      const text = readFileSync(args.path, 'utf8');
      const eager = 'const segmenter = new Intl.Segmenter(undefined, { granularity: "grapheme" });';
      if (!text.includes(eager) || text.split('segmenter.segment(str)').length !== 2) throw new Error(`quick-text-width: ${args.path} changed; review this plugin`);
      return {
        contents: `import { narrowGraphemes } from ${JSON.stringify(join(dist, 'src', 'build', 'narrow-text.js'))};
${text
  .replace(eager, 'let graphemeSegmenter; const segmenter = { segment: (s) => narrowGraphemes(s) ?? (graphemeSegmenter ??= new Intl.Segmenter(undefined, { granularity: "grapheme" })).segment(s) };')}`,
        loader: 'js',
        resolveDir: dirname(args.path),
      };
    });
  },
};

/**
 * better-sqlite3's JavaScript goes into the bundle (compiled from the code cache with the rest);
 * only its native addon is loaded from node_modules. The `bindings` package it would use to find
 * the addon searches from the calling file, which inside a bundle is the wrong place.
 */
const sqliteAddon: Plugin = {
  name: 'sqlite-addon',
  setup(b) {
    b.onResolve({ filter: /^bindings$/ }, (args) => (args.importer.includes(join('node_modules', 'better-sqlite3')) ? { path: 'bindings', namespace: 'headroom' } : undefined));
    b.onLoad({ filter: /^bindings$/, namespace: 'headroom' }, () => ({
      loader: 'js',
      contents: "const { dirname, join } = require('node:path'); const packageJson = ['better-sqlite3', 'package.json'].join('/'); module.exports = (name) => require(join(dirname(require.resolve(packageJson)), 'build', 'Release', name));",
    }));
  },
};

/**
 * commander loads node:child_process as it loads (for executable subcommands, which Headroom has
 * none of), and with it Node's dgram and socket-list modules: about 2 ms of every start. Here it
 * loads on first spawn.
 */
const lazyChildProcess: Plugin = {
  name: 'lazy-child-process',
  setup(b) {
    b.onLoad({ filter: /[\\/]commander[\\/]lib[\\/]command\.js$/ }, (args) => {
      const text = readFileSync(args.path, 'utf8');
      const eager = "const childProcess = require('node:child_process');";
      // Pinned commander version: if its source moves, fail the build rather than ship a guess.
      if (!text.includes(eager) || text.split('childProcess.').length !== 4) throw new Error(`lazy-child-process: ${args.path} changed; review this plugin`);
      return { contents: text.replace(eager, "const childProcess = { spawn: (...args) => require('node:child_process').spawn(...args) };"), loader: 'js', resolveDir: dirname(args.path) };
    });
  },
};

const common: BuildOptions = {
  absWorkingDir: root,
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  define: {
    // React's production build: no development checks on every render.
    'process.env.NODE_ENV': '"production"',
    // Ink's layout engine asks `typeof fetch` to choose how to load its WebAssembly, and in Node 20
    // that first look at fetch loads the whole HTTP client (~50 ms). Nothing here fetches.
    fetch: 'undefined',
    'import.meta.url': '__headroomModuleUrl',
  },
  banner: { js: "var __headroomModuleUrl = require('node:url').pathToFileURL(__filename).href;" },
  // Less source for V8 to parse; names kept for readable stack traces.
  minifyWhitespace: true,
  minifySyntax: true,
  logLevel: 'warning',
  metafile: true,
};

const entry = [join(dist, 'src', 'cli', 'main.js')];
const results = await Promise.all([
  build({ ...common, entryPoints: entry, outfile: join(outdir, 'cli.cjs'), plugins: [zodEnglishOnly, lazyChildProcess, withoutScreens, sqliteAddon] }),
  build({ ...common, entryPoints: entry, outfile: join(outdir, 'app.cjs'), plugins: [zodEnglishOnly, lazyChildProcess, inkAsCommonJs, quickTextWidth, sqliteAddon] }),
  // A large import's reading thread (row-feed.ts): one file instead of the hundred modules it
  // would load, so the first rows reach the writer sooner.
  build({ ...common, entryPoints: [join(dist, 'src', 'catalog', 'import', 'parse-worker.js')], outfile: join(outdir, 'parse-worker.cjs'), plugins: [zodEnglishOnly] }),
]);

/*
 * Plain ASCII, so the launcher can read a bundle as Latin-1: V8 then keeps it as a one-byte string
 * instead of decoding UTF-8 into a two-byte one (about 35 ms for app.cjs here). esbuild escapes
 * strings but leaves a few characters in regular expressions (µ, Ω, ’); a \uXXXX escape of each
 * UTF-16 unit means the same there, in strings, templates and identifiers.
 * The launcher's bundles are written already wrapped as Node wraps a CommonJS module (without the
 * entry's #! line), so it compiles the file's text as it is instead of a copy joined to the wrapper.
 */
const launched = new Set(['cli.cjs', 'app.cjs'].map((name) => join(outdir, name)));
for (const file of results.flatMap((r) => Object.keys(r.metafile!.outputs))) {
  const path = join(root, file);
  const text = readFileSync(path, 'utf8');
  if (/String\.raw`[^`]*[^\x00-\x7f]/.test(text)) throw new Error(`${file}: a raw template holds non-ASCII text; escaping would change it`);
  const ascii = text.replace(/[^\x00-\x7f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
  // Only the bundles the launcher loads: any other file Node runs itself, and wraps itself.
  writeFileSync(path, launched.has(path) ? Module.wrap(ascii.replace(/^#!.*/, '')) : ascii);
}

const bytes = results.flatMap((r) => Object.values(r.metafile!.outputs)).reduce((sum, o) => sum + o.bytes, 0);
console.log(`bundle: cli.cjs, app.cjs and parse-worker.cjs, ${(bytes / 1e6).toFixed(1)} MB in ${outdir}`);

// `headroom` is the launcher itself (package.json bin): runnable as a file, too.
chmodSync(join(dist, 'src', 'cli', 'launch.cjs'), 0o755);

/*
 * One typical command leaves the code cache for the command-line bundle. It runs twice: the first
 * run also builds the demo catalog, and a cache holds every function its run compiled, so its
 * cache is dropped and the second run's (a pick on an existing catalog) kept: about 40 KB less
 * for every command to read and deserialise.
 */
const data = mkdtempSync(join(tmpdir(), 'headroom-build-'));
for (const pass of ['demo catalog', 'code cache']) {
  for (const file of readdirSync(outdir).filter((f) => f.endsWith('.cache'))) rmSync(join(outdir, file));
  const trained = spawnSync(
    process.execPath,
    [join(dist, 'src', 'cli', 'launch.cjs'), '--demo', 'pick', join(root, 'catalog-demo', 'roles', 'buck-freewheel.yaml'), '--ref', 'D4'],
    { env: { ...process.env, XDG_DATA_HOME: data, NO_COLOR: '1' }, encoding: 'utf8' },
  );
  if (trained.status !== 0) {
    rmSync(data, { recursive: true, force: true });
    throw new Error(`bundle check failed (${pass}): headroom pick exited ${trained.status}\n${trained.stderr}`);
  }
}
rmSync(data, { recursive: true, force: true });
console.log('bundle: checked with `headroom --demo pick` (code cache written)');
