/**
 * Embedding the caller's TrueType fonts. jsPDF's built-in fonts cover WinAnsi only, so Ω, µ,
 * ≤, – and → would print as gaps; an embedded TrueType font (jsPDF subsets it to the glyphs
 * used) prints them and lets a text extractor read them back.
 */
import type { jsPDF } from 'jspdf';

/** The TrueType files of the report's fonts (e.g. DejaVu Sans, DejaVu Sans Bold, DejaVu Sans Mono). */
export interface PdfFonts {
  readonly regular: Uint8Array;
  readonly bold: Uint8Array;
  /** For ids (nets, pins, rules); the regular font stands in when absent. */
  readonly mono?: Uint8Array;
}

/** The family names the report's drawing code passes to `setFont` and to the tables. */
export interface FontNames {
  readonly sans: string;
  readonly mono: string;
}

const SANS = 'rc-sans';
const MONO = 'rc-mono';

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';

/**
 * Base64 (RFC 4648) of bytes. Written here because the engine's modules use no Node built-ins
 * (no Buffer), and `btoa` wants a binary string, which costs a second copy of a large font.
 */
export function toBase64(bytes: Uint8Array): string {
  const out: string[] = [];
  const chunk: string[] = [];
  const n = bytes.length;
  let k = 0;
  for (; k + 2 < n; k += 3) {
    const v = (bytes[k]! << 16) | (bytes[k + 1]! << 8) | bytes[k + 2]!;
    chunk.push(ALPHABET[v >>> 18]! + ALPHABET[(v >>> 12) & 63]! + ALPHABET[(v >>> 6) & 63]! + ALPHABET[v & 63]!);
    // Joining in slices keeps the intermediate arrays small for a 700 kB font.
    if (chunk.length === 4096) {
      out.push(chunk.join(''));
      chunk.length = 0;
    }
  }
  if (k < n) {
    const v = (bytes[k]! << 16) | ((k + 1 < n ? bytes[k + 1]! : 0) << 8);
    chunk.push(`${ALPHABET[v >>> 18]! + ALPHABET[(v >>> 12) & 63]! + (k + 1 < n ? ALPHABET[(v >>> 6) & 63]! : '=')}=`);
  }
  out.push(chunk.join(''));
  return out.join('');
}

/** The bytes as a binary string, one character per byte (0–255), in slices that stay within call limits. */
export function toBinaryString(bytes: Uint8Array): string {
  const out: string[] = [];
  for (let k = 0; k < bytes.length; k += 8192) out.push(String.fromCharCode(...bytes.subarray(k, k + 8192)));
  return out.join('');
}

/** A TrueType file starts with the sfnt version 0x00010000 (the OpenType specification, "Font file"). */
const isTrueType = (bytes: Uint8Array) => bytes[0] === 0 && bytes[1] === 1 && bytes[2] === 0 && bytes[3] === 0;

// The editor may write several reports with the same font bytes: convert each file once.
const vfsText = new WeakMap<Uint8Array, string>();

/**
 * The font as jsPDF's virtual file system takes it. jsPDF reads a TrueType file given as a
 * binary string as it is, and anything else as base64: the binary string spares encoding the
 * file here and decoding it there (a quarter of the PDF's cost in a fresh process, measured).
 */
function vfsOf(bytes: Uint8Array): string {
  let text = vfsText.get(bytes);
  if (text === undefined) {
    text = isTrueType(bytes) ? toBinaryString(bytes) : toBase64(bytes);
    vfsText.set(bytes, text);
  }
  return text;
}

function embed(doc: jsPDF, file: string, bytes: Uint8Array, family: string, style: 'normal' | 'bold'): void {
  doc.addFileToVFS(file, vfsOf(bytes));
  doc.addFont(file, family, style, 'Identity-H');
}

/**
 * Registers the fonts with `doc` and makes the regular one current. The mono family has no
 * bold: the drawing code never asks for it (autotable's column styles, where mono is set, do
 * not reach the bold head row).
 */
export function registerFonts(doc: jsPDF, fonts: PdfFonts): FontNames {
  embed(doc, 'rc-sans.ttf', fonts.regular, SANS, 'normal');
  embed(doc, 'rc-sans-bold.ttf', fonts.bold, SANS, 'bold');
  embed(doc, 'rc-mono.ttf', fonts.mono ?? fonts.regular, MONO, 'normal');
  doc.setFont(SANS, 'normal');
  return { sans: SANS, mono: MONO };
}
