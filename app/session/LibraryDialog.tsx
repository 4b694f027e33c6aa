/**
 * The library: every stored design with its last change and its counts, the recently
 * deleted ones, and the saved revisions of the open design; new, import, open, rename,
 * duplicate, delete, restore.
 */
import { useRef } from 'react';
import { useStore } from 'zustand';
import { MAX_DESIGN_FILE_BYTES } from '../storage/designFile.ts';
import { DeletedList } from './DeletedList.tsx';
import { DesignList } from './DesignList.tsx';
import { NativeDialog } from '../panels/NativeDialog.tsx';
import { Notices } from './Notices.tsx';
import { RevisionList } from './RevisionList.tsx';
import type { LibraryView } from './session.ts';
import { useLive, useSession, useSessionState } from './SessionProvider.tsx';

const MB = MAX_DESIGN_FILE_BYTES / (1024 * 1024);

function Tab({ view, current, children }: { view: LibraryView; current: LibraryView; children: React.ReactNode }) {
  const session = useSession();
  return (
    <button
      type="button"
      role="tab"
      aria-selected={view === current}
      className="rc-tab"
      data-view={view}
      onClick={() => session.setView(view)}
    >
      {children}
    </button>
  );
}

function LibraryBody({ view }: { view: LibraryView }) {
  const session = useSession();
  const library = session.library;
  const storageError = useSessionState((s) => s.storageError);
  const open = useSessionState((s) => s.open);
  const title = useStore(open.store, (s) => s.design.title);
  const listing = useLive(library === null ? null : () => library.list(), [library]);
  const picker = useRef<HTMLInputElement>(null);
  const designs = listing.value?.designs ?? [];
  const deleted = listing.value?.deleted ?? [];

  return (
    <NativeDialog
      className="rc-library"
      labelledBy="rc-library-head"
      testId="library"
      onClose={() => session.setView(null)}
    >
      <header className="rc-library-top">
        <h2 id="rc-library-head">Designs</h2>
        <div className="rc-library-do">
          <button
            type="button"
            className="rc-primary"
            data-testid="library-new"
            disabled={library === null}
            onClick={() => void session.newDesign()}
          >
            New design
          </button>
          <button type="button" data-testid="library-import" onClick={() => picker.current?.click()}>
            Import design file…
          </button>
          <input
            ref={picker}
            type="file"
            hidden
            accept=".json,application/json"
            data-testid="import-file"
            onChange={(e) => {
              const file = e.target.files?.[0];
              e.target.value = '';
              if (file !== undefined) void session.importFile(file);
            }}
          />
          <button
            type="button"
            className="rc-icon-btn rc-close"
            aria-label="Close"
            onClick={() => session.setView(null)}
          >
            ×
          </button>
        </div>
      </header>
      <div className="rc-tabs" role="tablist" aria-label="Library views">
        <Tab view="designs" current={view}>
          Designs <span className="rc-n">{designs.length}</span>
        </Tab>
        <Tab view="deleted" current={view}>
          Recently deleted <span className="rc-n">{deleted.length}</span>
        </Tab>
        <Tab view="history" current={view}>
          History of “{title}”
        </Tab>
      </div>
      <Notices />
      <div className="rc-library-view" role="tabpanel">
        {storageError !== null && (
          <p className="rc-empty">
            Nothing can be stored in this browser ({storageError}). Import and export still work.
          </p>
        )}
        {listing.error !== null && <p className="rc-empty">The library could not be read: {listing.error}</p>}
        {listing.value !== undefined && listing.value.skipped.length > 0 && (
          <p className="rc-lib-skipped" data-testid="library-skipped">
            {listing.value.skipped.length} stored {listing.value.skipped.length === 1 ? 'record' : 'records'} could not
            be read and {listing.value.skipped.length === 1 ? 'is' : 'are'} left out:{' '}
            {listing.value.skipped.map((s) => `${s.where}: ${s.message}`).join('; ')}
          </p>
        )}
        {view === 'designs' && <DesignList designs={designs} openId={open.id} />}
        {view === 'deleted' && <DeletedList deleted={deleted} />}
        {view === 'history' && <RevisionList />}
      </div>
      <footer className="rc-library-foot">
        Designs are kept in this browser, each with its last 50 saves. Import reads a design file (.railcross.json or
        .json, at most {MB} MB); you can also drop one on the canvas. Deleted designs can be restored for 30 days.
      </footer>
    </NativeDialog>
  );
}

export function LibraryDialog() {
  const view = useSessionState((s) => s.view);
  return view === null ? null : <LibraryBody view={view} />;
}
