/** The editor: parts palette, canvas, findings and details, top bar and status line. */
import { ReactFlowProvider } from '@xyflow/react';
import '@xyflow/react/dist/style.css';
import './styles.css';
import { Canvas } from './canvas/Canvas.tsx';
import { DetailsPanel } from './panels/DetailsPanel.tsx';
import { FindingsPanel } from './panels/FindingsPanel.tsx';
import { Palette } from './panels/Palette.tsx';
import { StatusLine } from './panels/StatusLine.tsx';
import { TopBar } from './panels/TopBar.tsx';
import { SideResizer, useSideWidth } from './panels/SideResizer.tsx';
import type { CSSProperties } from 'react';
import type { SaveIndicator } from './storage/saver.ts';
import { EditorProvider } from './store/EditorProvider.tsx';
import type { EditorStore } from './store/editorStore.ts';

export function App({ store, saver }: { store: EditorStore; saver: SaveIndicator }) {
  const [sideWidth, setSideWidth] = useSideWidth();
  return (
    <EditorProvider store={store}>
      <ReactFlowProvider>
        <div className="rc-app" style={{ '--side-width': `${sideWidth}px` } as CSSProperties}>
          <TopBar />
          <Palette />
          <Canvas />
          <div className="rc-side">
            <SideResizer width={sideWidth} onWidth={setSideWidth} />
            <FindingsPanel />
            <DetailsPanel />
          </div>
          <StatusLine saver={saver} />
        </div>
      </ReactFlowProvider>
    </EditorProvider>
  );
}
