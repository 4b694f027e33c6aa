/** An in-memory io for `main(argv, io)`: files in a map, output captured. */
import type { CliIo } from '../../rules/cli/main.ts';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';

export interface FakeIo extends CliIo {
  out: string;
  err: string;
  /** Text files, as read and as written. */
  files: Map<string, string>;
  /** Files written as bytes (the PDF report). */
  binaries: Map<string, Uint8Array>;
  /** Paths whose writing fails, as a read-only directory would. */
  readOnly: Set<string>;
}

export function fakeIo(files: Record<string, string> = {}, env: Record<string, string | undefined> = {}): FakeIo {
  const io: FakeIo = {
    out: '',
    err: '',
    files: new Map(Object.entries(files)),
    binaries: new Map(),
    readOnly: new Set(),
    env,
    stdout(text) {
      io.out += text;
    },
    stderr(text) {
      io.err += text;
    },
    readFile(path) {
      const text = io.files.get(path);
      if (text === undefined) throw new Error(`ENOENT: no such file or directory, open '${path}'`);
      return text;
    },
    writeFile(path, data) {
      if (io.readOnly.has(path)) throw new Error(`EACCES: permission denied, open '${path}'`);
      if (typeof data === 'string') io.files.set(path, data);
      else io.binaries.set(path, data);
    },
    // The real fonts: the PDF writer needs TrueType files it can parse.
    loadPdfFonts: loadDejaVuFonts,
  };
  return io;
}
