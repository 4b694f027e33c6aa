import { useEffect } from 'react';
import { CANVAS_ID } from '../canvas/placement.ts';
import type { Session } from './session.ts';

const OVER_CLASS = 'rc-files-over';

const hasFiles = (e: DragEvent) => e.dataTransfer?.types.includes('Files') === true;
const onCanvas = (e: DragEvent) => e.target instanceof Element && e.target.closest(`#${CANVAS_ID}`) !== null;

/**
 * Design files dropped on the canvas are imported as new designs. A file dropped anywhere
 * else is ignored rather than opened by the browser in place of the editor.
 */
export function useFileDrop(session: Session): void {
  useEffect(() => {
    const root = document.documentElement;
    const onDragOver = (e: DragEvent) => {
      if (!hasFiles(e)) return;
      e.preventDefault();
      const here = onCanvas(e);
      if (e.dataTransfer !== null) e.dataTransfer.dropEffect = here ? 'copy' : 'none';
      root.classList.toggle(OVER_CLASS, here);
    };
    const onDragLeave = (e: DragEvent) => {
      if (e.relatedTarget === null) root.classList.remove(OVER_CLASS);
    };
    const onDrop = (e: DragEvent) => {
      if (!hasFiles(e)) return;
      e.preventDefault();
      root.classList.remove(OVER_CLASS);
      if (!onCanvas(e)) return;
      const files = [...(e.dataTransfer?.files ?? [])];
      void (async () => {
        for (const file of files) await session.importFile(file);
      })();
    };
    addEventListener('dragover', onDragOver);
    addEventListener('dragleave', onDragLeave);
    addEventListener('drop', onDrop);
    return () => {
      removeEventListener('dragover', onDragOver);
      removeEventListener('dragleave', onDragLeave);
      removeEventListener('drop', onDrop);
      root.classList.remove(OVER_CLASS);
    };
  }, [session]);
}
