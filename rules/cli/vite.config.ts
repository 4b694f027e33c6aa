/**
 * The command line's build: `vite build -c rules/cli/vite.config.ts` bundles rules/cli/bin.ts and
 * every module it needs (zod, jsPDF and its helpers included) into dist-cli/railcross.mjs for
 * Node, and copies the PDF report's fonts beside it. The installed package then needs nothing
 * but Node. The PDF writer stays a chunk of its own, loaded only for --pdf.
 */
import { chmodSync, copyFileSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig, type Plugin } from 'vite';
import { BUNDLED_FONT_FILES } from './fontFiles.ts';

// The repository's root: this file sits in rules/cli/.
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const outDir = join(root, 'dist-cli');
const require = createRequire(import.meta.url);

/**
 * Copies the DejaVu TrueType files the PDF report embeds into dist-cli/fonts/, and makes the
 * command executable: `npm install` links package.json's "bin" before `prepare` builds it, so
 * the file it would have marked executable does not exist yet.
 */
function finish(): Plugin {
  let dir = outDir;
  return {
    name: 'railcross-cli-finish',
    apply: 'build',
    configResolved(config) {
      dir = config.build.outDir;
    },
    writeBundle() {
      mkdirSync(join(dir, 'fonts'), { recursive: true });
      for (const file of BUNDLED_FONT_FILES)
        copyFileSync(require.resolve(`dejavu-fonts-ttf/ttf/${file}`), join(dir, 'fonts', file));
      chmodSync(join(dir, 'railcross.mjs'), 0o755);
    },
  };
}

export default defineConfig({
  // The editor's plugins and public files play no part in the command.
  plugins: [finish()],
  root,
  publicDir: false,
  logLevel: 'warn',
  ssr: { noExternal: true, target: 'node' },
  resolve: {
    alias: Object.fromEntries(
      ['html2canvas', 'canvg', 'dompurify'].map((name) => [name, join(root, 'rules/cli/unavailable.ts')]),
    ),
  },
  build: {
    ssr: 'rules/cli/bin.ts',
    outDir,
    emptyOutDir: true,
    target: 'node20',
    minify: true,
    sourcemap: false,
    reportCompressedSize: false,
    rollupOptions: {
      output: {
        format: 'es',
        entryFileNames: 'railcross.mjs',
        chunkFileNames: 'chunks/[name]-[hash].mjs',
        banner: '#!/usr/bin/env node',
      },
    },
  },
});
