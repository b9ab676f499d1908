/**
 * Bundles the compiled command line (dist/src/cli/main.js) into dist/bundle/headroom.js and
 * lazily loaded chunks, which is what `headroom`, `npm start` and the command-line tests run.
 * Why: Node spends most of a cold start resolving, reading and compiling the hundreds of small
 * module files of Ink, React and our own layers (bench/README.md, start-up); one file per
 * command path cuts that several times. Each command group and screen stays its own chunk, so
 * `headroom pick` never loads Ink. Build tooling only: nothing in the core imports this file.
 */
import { build } from 'esbuild';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { packageRoot } from '../catalog/package-root.js';

const root = packageRoot();
const outdir = join(root, 'dist', 'bundle');
rmSync(outdir, { recursive: true, force: true });

const result = await build({
  entryPoints: { headroom: join(root, 'dist', 'src', 'cli', 'main.js') },
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  outdir,
  chunkNames: 'chunks/[name]-[hash]',
  // Native addon: loaded from node_modules at run time. The devtools client is optional in Ink
  // and only imported when DEV=true; Ink then says how to install it.
  external: ['better-sqlite3', 'react-devtools-core'],
  define: {
    // React's production build: no development checks on every render.
    'process.env.NODE_ENV': '"production"',
    // Ink's layout engine asks `typeof fetch` to choose how to load its WebAssembly, and in Node 20
    // that first look at fetch loads the whole HTTP client (~50 ms). Nothing here fetches.
    fetch: 'undefined',
  },
  // Less source for V8 to parse at every start; names kept for readable stack traces.
  minifyWhitespace: true,
  minifySyntax: true,
  // Bundled CommonJS packages call require(); give each ES chunk one.
  banner: { js: "import { createRequire as __headroomRequire } from 'node:module'; const require = __headroomRequire(import.meta.url);" },
  logLevel: 'warning',
  metafile: true,
});

const bytes = Object.values(result.metafile.outputs).reduce((sum, o) => sum + o.bytes, 0);
console.log(`bundle: ${Object.keys(result.metafile.outputs).length} files, ${(bytes / 1e6).toFixed(1)} MB in ${outdir}`);
