/** An in-memory io for `main(argv, io)`: files in a map, output captured. */
import type { CliIo } from '../../rules/cli/main.ts';

export interface FakeIo extends CliIo {
  out: string;
  err: string;
  files: Map<string, string>;
  /** Paths whose writing fails, as a read-only directory would. */
  readOnly: Set<string>;
}

export function fakeIo(files: Record<string, string> = {}, env: Record<string, string | undefined> = {}): FakeIo {
  const io: FakeIo = {
    out: '',
    err: '',
    files: new Map(Object.entries(files)),
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
      io.files.set(path, data);
    },
  };
  return io;
}
