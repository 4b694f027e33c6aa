/**
 * The command line's real io: files through node:fs, output through process. The only module
 * of the project, with rules/cli/bin.ts (the built command's entry), that is bound to Node.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import process from 'node:process';
import { fileURLToPath } from 'node:url';
import type { PdfFonts } from '../report/pdf/fonts.ts';
import type { BUNDLED_FONT_FILES } from './fontFiles.ts';
import { main, EXIT_UNCHECKED, type CliIo } from './main.ts';

const require = createRequire(import.meta.url);

/**
 * The built command (dist-cli/railcross.mjs) carries the fonts beside it in fonts/, so that the
 * installed package needs no other; run from source, they come from the dejavu-fonts-ttf package.
 */
const builtFonts = fileURLToPath(new URL('./fonts/', import.meta.url));
const fontPath = (file: (typeof BUNDLED_FONT_FILES)[number]): string =>
  existsSync(builtFonts + file) ? builtFonts + file : require.resolve(`dejavu-fonts-ttf/ttf/${file}`);
const dejavu = (file: (typeof BUNDLED_FONT_FILES)[number]): Uint8Array => new Uint8Array(readFileSync(fontPath(file)));

/** DejaVu Sans, Sans Bold and Sans Mono: they cover Ω, µ, ≤, – and →, which the PDF's built-in fonts lack. */
export function loadDejaVuFonts(): PdfFonts {
  return { regular: dejavu('DejaVuSans.ttf'), bold: dejavu('DejaVuSans-Bold.ttf'), mono: dejavu('DejaVuSansMono.ttf') };
}

/** Standard streams, the file system and the environment of this process. */
export const nodeIo: CliIo = {
  stdout: (text) => void process.stdout.write(text),
  stderr: (text) => void process.stderr.write(text),
  readFile: (path) => readFileSync(path, 'utf8'),
  writeFile: (path, data) => writeFileSync(path, data),
  loadPdfFonts: loadDejaVuFonts,
  env: process.env,
};

/**
 * Runs `main` with this process's arguments and io, and returns its exit status. A reader that
 * closes the pipe early (`railcross check … | head`) ends the output quietly.
 */
export async function run(argv: readonly string[] = process.argv.slice(2)): Promise<number> {
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw error;
  });
  try {
    return await main(argv, nodeIo);
  } catch (error) {
    process.stderr.write(
      `railcross: internal error, please report it: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`,
    );
    return EXIT_UNCHECKED;
  }
}
