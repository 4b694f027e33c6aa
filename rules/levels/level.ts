/**
 * The Level grammar of design-format.md, compiled to `a + b·VDD`.
 *
 *   level   := term (("+" | "-") term)*
 *   term    := ["-"] factor ("*" factor)*      at most one VDD per term
 *   factor  := decimal | "VDD"
 *   decimal := digits ["." digits] | "." digits
 *
 * A hand-written scanner: nothing here is ever evaluated as code.
 */

/** A Level as stored in the design: volts, or a linear expression of the pin's VDD. */
export type Level = number | string;

/** `a + b·VDD`, the only shape a Level can take. */
export interface LinearLevel {
  readonly a: number;
  readonly b: number;
}

export type LevelResult = { ok: true; level: LinearLevel } | { ok: false; error: string; at: number };

type Token = { kind: 'num'; value: number; at: number } | { kind: 'vdd' | '+' | '-' | '*'; at: number };

function isDigit(c: string | undefined): boolean {
  return c !== undefined && c >= '0' && c <= '9';
}

function tokenize(text: string): Token[] | { error: string; at: number } {
  const tokens: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const c = text[i]!;
    if (c === ' ') {
      i++;
      continue;
    }
    if (c === '+' || c === '-' || c === '*') {
      tokens.push({ kind: c, at: i });
      i++;
      continue;
    }
    if (text.startsWith('VDD', i)) {
      tokens.push({ kind: 'vdd', at: i });
      i += 3;
      continue;
    }
    if (isDigit(c) || c === '.') {
      const start = i;
      while (isDigit(text[i])) i++;
      const intDigits = i - start;
      if (text[i] === '.') {
        i++;
        const fracStart = i;
        while (isDigit(text[i])) i++;
        // "digits ." without fraction digits and a lone "." are not decimals in the grammar.
        if (i === fracStart) return { error: 'a digit after the decimal point', at: i };
      } else if (intDigits === 0) {
        return { error: 'a number', at: start };
      }
      tokens.push({ kind: 'num', value: Number(text.slice(start, i)), at: start });
      continue;
    }
    return { error: `a number, VDD, +, - or * (found "${c}")`, at: i };
  }
  return tokens;
}

/** Parse and compile a Level string. Never throws. */
export function parseLevel(text: string): LevelResult {
  const tokens = tokenize(text);
  if (!Array.isArray(tokens)) return { ok: false, ...tokens };
  if (tokens.length === 0) return { ok: false, error: 'a number or an expression of VDD', at: 0 };
  let pos = 0;
  let a = 0;
  let b = 0;
  let first = true;
  while (pos < tokens.length) {
    let sign = 1;
    if (!first) {
      const op = tokens[pos]!;
      if (op.kind !== '+' && op.kind !== '-') return { ok: false, error: '"+" or "-" between terms', at: op.at };
      sign = op.kind === '-' ? -1 : 1;
      pos++;
    }
    if (tokens[pos]?.kind === '-') {
      sign = -sign;
      pos++;
    }
    let coefficient = sign;
    let vddCount = 0;
    let expectFactor = true;
    while (pos < tokens.length) {
      const t = tokens[pos]!;
      if (expectFactor) {
        if (t.kind === 'num') coefficient *= t.value;
        else if (t.kind === 'vdd') vddCount++;
        else return { ok: false, error: 'a number or VDD', at: t.at };
        if (vddCount > 1) return { ok: false, error: 'at most one VDD per term (a Level is linear in VDD)', at: t.at };
        expectFactor = false;
        pos++;
      } else if (t.kind === '*') {
        expectFactor = true;
        pos++;
      } else {
        break;
      }
    }
    if (expectFactor) return { ok: false, error: 'a number or VDD at the end', at: text.length };
    if (vddCount === 1) b += coefficient;
    else a += coefficient;
    first = false;
  }
  if (!Number.isFinite(a) || !Number.isFinite(b)) return { ok: false, error: 'a finite number', at: 0 };
  return { ok: true, level: { a, b } };
}

const compiled = new Map<string, LinearLevel>();

/**
 * The compiled form of a Level, cached per string. For a Level that does not parse (only
 * possible on a document that skipped the reader) it throws: the engine works on validated
 * designs, the reader is the edge.
 */
export function compileLevel(level: Level): LinearLevel {
  if (typeof level === 'number') return { a: level, b: 0 };
  let hit = compiled.get(level);
  if (hit === undefined) {
    const r = parseLevel(level);
    if (!r.ok) throw new Error(`Level "${level}" does not parse: expected ${r.error} at ${r.at}`);
    hit = r.level;
    compiled.set(level, hit);
  }
  return hit;
}

/** The Level's value in volts at a supply voltage. */
export function levelAt(level: Level, vdd: number): number {
  const { a, b } = compileLevel(level);
  return a + b * vdd;
}
