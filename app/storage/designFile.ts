/**
 * Design files in and out: an imported file goes through the engine's reader (JSON →
 * migrate → schema → references) and nothing else; an exported one is the canonical writer's
 * text. File names are `<slug>.railcross.json`: the slug keeps a file name safe on every
 * system, and the double extension says what the JSON is while any JSON tool still opens it.
 */
import { ROOT_PATH } from '../../rules/model/index.ts';
import { readDesign, type ReadResult } from '../../rules/model/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { writeDesign } from '../../rules/model/index.ts';
import { slugOf } from '../../rules/report/index.ts';

export { slugOf };

/** The largest design file the editor reads: 20 MB (a 2,000-part design is about 1 MB). */
export const MAX_DESIGN_FILE_BYTES = 20 * 1024 * 1024;

/** Read a design file (from a picker or a drop). Never throws. */
export async function readDesignFile(file: Blob): Promise<ReadResult> {
  if (file.size > MAX_DESIGN_FILE_BYTES) {
    const mb = (file.size / (1024 * 1024)).toFixed(1);
    return {
      ok: false,
      errors: [{ path: ROOT_PATH, message: `the file is ${mb} MB: expected at most 20 MB for a design file` }],
    };
  }
  let text: string;
  try {
    text = await file.text();
  } catch (error) {
    return {
      ok: false,
      errors: [
        {
          path: ROOT_PATH,
          message: `the file could not be read (${error instanceof Error ? error.message : String(error)})`,
        },
      ],
    };
  }
  return readDesign(text);
}

/** `greenhouse-irrigation-controller.railcross.json` */
export function designFileName(title: string): string {
  return `${slugOf(title)}.railcross.json`;
}

/** `greenhouse-irrigation-controller-report.json`, beside the PDF's `…-report.pdf`. */
export function reportJsonFileName(title: string): string {
  return `${slugOf(title, 'railcross')}-report.json`;
}

/** `greenhouse-irrigation-controller-report.md`: the Markdown report, for a review or a pull request. */
export function reportMarkdownFileName(title: string): string {
  return `${slugOf(title, 'railcross')}-report.md`;
}

/** The text "Export design" writes: the canonical writer's (stable key order, final newline). */
export function designFileText(design: Design): string {
  return writeDesign(design);
}
