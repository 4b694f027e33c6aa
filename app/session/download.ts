/** Handing a file to the user: a download of bytes or text the page made. */
import type { Design } from '../../rules/model/index.ts';
import { designFileName, designFileText } from '../storage/designFile.ts';

/** Offer `data` as a download named `name`. */
export function downloadFile(name: string, data: string | Uint8Array, type: string): void {
  // Bytes made here (jsPDF's output) sit in an ordinary ArrayBuffer, never a shared one.
  const part = typeof data === 'string' ? data : (data as Uint8Array<ArrayBuffer>);
  const url = URL.createObjectURL(new Blob([part], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  // The download has its own copy once it starts; a minute is ample.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** "Export design": the canonical v1 file, named after the title. */
export function exportDesignFile(design: Design): void {
  downloadFile(designFileName(design.title), designFileText(design), 'application/json');
}
