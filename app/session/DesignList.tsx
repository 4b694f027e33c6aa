/** The library's designs: open, rename, duplicate, delete. */
import { useState } from 'react';
import type { DesignRecord } from '../storage/db.ts';
import { useSession } from './SessionProvider.tsx';
import { deletedNoticeKey } from './session.ts';
import { fullWhen, shortWhen } from './when.ts';

function RenameField({ record, onDone }: { record: DesignRecord; onDone: () => void }) {
  const session = useSession();
  const [text, setText] = useState(record.title);
  const commit = () => {
    const title = text.trim();
    if (title !== '' && title !== record.title) void session.rename(record.id, title);
    onDone();
  };
  return (
    <input
      className="rc-lib-rename"
      aria-label={`New title for ${record.title}`}
      value={text}
      // biome-ignore lint/a11y/noAutofocus: the field appears because the user chose Rename
      autoFocus
      data-testid="rename-field"
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') {
          e.preventDefault();
          e.stopPropagation();
          onDone();
        }
      }}
    />
  );
}

function Count({ n, kind }: { n: number; kind: 'error' | 'warning' }) {
  return (
    <td className={`rc-lib-num${n > 0 ? ` rc-lib-num--${kind}` : ''}`} data-count={kind}>
      {n}
    </td>
  );
}

function DesignRow({ record, isOpen }: { record: DesignRecord; isOpen: boolean }) {
  const session = useSession();
  const [renaming, setRenaming] = useState(false);
  const remove = async () => {
    await session.remove(record.id);
    session.notify({
      key: deletedNoticeKey(record.id),
      tone: 'info',
      title: `“${record.title}” moved to Recently deleted`,
      lines: ['It can be restored for 30 days.'],
      actions: [
        {
          label: 'Restore',
          run: () => {
            void session.restore(record.id);
          },
        },
      ],
    });
  };
  return (
    <tr
      className={isOpen ? 'rc-lib-row rc-lib-row--open' : 'rc-lib-row'}
      data-testid="library-row"
      data-design={record.id}
      data-title={record.title}
    >
      <td>
        <div className="rc-lib-cell">
          {renaming ? (
            <RenameField record={record} onDone={() => setRenaming(false)} />
          ) : (
            <button
              type="button"
              className="rc-link"
              title={isOpen ? 'Open in this tab' : 'Open this design'}
              onClick={() => void session.openDesign(record.id).then(() => session.setView(null))}
            >
              {record.title === '' ? '(untitled)' : record.title}
            </button>
          )}
          {isOpen && <span className="rc-lib-badge">open</span>}
        </div>
      </td>
      <td className="rc-lib-when" title={fullWhen(record.updatedAt)}>
        {shortWhen(record.updatedAt)}
      </td>
      <Count n={record.errors} kind="error" />
      <Count n={record.warnings} kind="warning" />
      <td className="rc-lib-acts">
        <button type="button" data-action="rename" onClick={() => setRenaming(true)}>
          Rename
        </button>
        <button type="button" data-action="duplicate" onClick={() => void session.duplicate(record.id)}>
          Duplicate
        </button>
        <button type="button" data-action="delete" onClick={() => void remove()}>
          Delete
        </button>
      </td>
    </tr>
  );
}

export function DesignList({ designs, openId }: { designs: readonly DesignRecord[]; openId: string | null }) {
  if (designs.length === 0) return <p className="rc-empty">No designs stored yet.</p>;
  return (
    <table className="rc-lib-table" data-testid="design-list">
      <thead>
        <tr>
          <th>Design</th>
          <th className="rc-lib-when">Last change</th>
          <th className="rc-lib-num" title="Unwaived errors in all power states">
            Errors
          </th>
          <th className="rc-lib-num" title="Unwaived warnings in all power states">
            Warnings
          </th>
          <th className="rc-lib-acts">
            <span className="rc-sr">Actions</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {designs.map((d) => (
          <DesignRow key={d.id} record={d} isOpen={d.id === openId} />
        ))}
      </tbody>
    </table>
  );
}
