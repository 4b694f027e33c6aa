/**
 * The PDF's block diagram draws chips at the editor's measures (rules/ cannot import app/, so
 * the numbers are written twice): this holds the two together.
 */
import { describe, expect, it } from 'vitest';
import { CHIP } from '../../rules/report/pdf/diagramLayout.ts';
import { CHIP_WIDTH, HEADER_HEIGHT, ROW_HEIGHT, STRIP_HEIGHT } from '../../app/canvas/chipLayout.ts';

describe('chip measures shared by the editor and the PDF diagram', () => {
  it.each([
    ['width', CHIP.width, CHIP_WIDTH],
    ['header', CHIP.header, HEADER_HEIGHT],
    ['pin row', CHIP.row, ROW_HEIGHT],
    ['top/bottom strip', CHIP.strip, STRIP_HEIGHT],
  ])('%s', (_what, pdf, editor) => {
    expect(pdf).toBe(editor);
  });
});
