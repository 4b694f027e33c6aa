/**
 * A small, strict argument parser for the command line: `--name value`, `--name=value`,
 * flags, `--` before a file name that starts with `-`. Unknown or repeated options are
 * errors, never guesses.
 */

/** What each option of a command takes. */
export type OptionSpec = Readonly<Record<string, 'flag' | 'value'>>;

export type Parsed =
  | { ok: true; positional: string[]; options: Map<string, string | true> }
  | { ok: false; error: string };

/** Parses `args` against `spec`. Option names in `spec` are written without the leading `--`. */
export function parseArgs(args: readonly string[], spec: OptionSpec, command: string): Parsed {
  const positional: string[] = [];
  const options = new Map<string, string | true>();
  for (let k = 0; k < args.length; k++) {
    const arg = args[k]!;
    if (arg === '--') {
      positional.push(...args.slice(k + 1));
      break;
    }
    if (!arg.startsWith('-') || arg === '-') {
      positional.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = (eq < 0 ? arg : arg.slice(0, eq)).replace(/^--?/, '');
    const kind = arg.startsWith('--') ? spec[name] : undefined;
    if (kind === undefined) {
      return { ok: false, error: `unknown option ${eq < 0 ? arg : arg.slice(0, eq)} for "${command}"` };
    }
    if (options.has(name)) return { ok: false, error: `--${name} is given twice` };
    if (kind === 'flag') {
      if (eq >= 0) return { ok: false, error: `--${name} takes no value` };
      options.set(name, true);
      continue;
    }
    let value: string | undefined;
    if (eq >= 0) value = arg.slice(eq + 1);
    else {
      value = args[k + 1];
      // `--out --json` is a forgotten value, not a file called "--json".
      if (value?.startsWith('--')) value = undefined;
      else k++;
    }
    if (value === undefined || value === '') return { ok: false, error: `--${name} needs a value` };
    options.set(name, value);
  }
  return { ok: true, positional, options };
}
