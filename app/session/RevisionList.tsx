/**
 * The saved revisions of the open design, each with what changed (the commands since the one
 * before): restore one as its current state (undoable) or as a new design.
 */
import { changesOf } from '../storage/changes.ts';
import { useSession, useLive, useSessionState } from './SessionProvider.tsx';
import { fullWhen, shortWhen } from './when.ts';

export function RevisionList() {
  const session = useSession();
  const library = session.library;
  const id = useSessionState((s) => s.open.id);
  const live = useLive(library === null || id === null ? null : () => library.revisions(id), [library, id]);
  if (library === null || id === null)
    return <p className="rc-empty">No revisions: nothing can be stored in this browser.</p>;
  const list = live.value;
  if (list === undefined) return null;
  const newest = list.revisions[0]?.rev;
  return (
    <>
      <p className="rc-lib-intro">
        Every save is a revision; the last 50 are kept. Restoring one makes it the current state (Undo takes it back) or
        a new design.
      </p>
      {list.skipped.length > 0 && (
        <p className="rc-lib-skipped">
          Left out, unreadable: {list.skipped.map((s) => `${s.where}: ${s.message}`).join('; ')}
        </p>
      )}
      <table className="rc-lib-table" data-testid="revision-list">
        <thead>
          <tr>
            <th>Revision</th>
            <th className="rc-lib-when">Saved</th>
            <th className="rc-lib-title-col">Title</th>
            <th className="rc-lib-changes">What changed</th>
            <th className="rc-lib-num">Errors</th>
            <th className="rc-lib-num">Warnings</th>
            <th className="rc-lib-acts">
              <span className="rc-sr">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {list.revisions.map((r) => (
            <tr
              key={r.rev}
              className={r.rev === newest ? 'rc-lib-row rc-lib-row--open' : 'rc-lib-row'}
              data-testid="revision-row"
              data-rev={r.rev}
            >
              <td>
                <div className="rc-lib-cell rc-lib-rev">
                  {r.rev}
                  {r.rev === newest && <span className="rc-lib-badge">current</span>}
                </div>
              </td>
              <td className="rc-lib-when" title={fullWhen(r.savedAt)}>
                {shortWhen(r.savedAt)}
              </td>
              <td className="rc-lib-title" title={r.title}>
                {r.title}
              </td>
              <td className="rc-lib-changes" data-testid="revision-changes">
                <Changes list={changesOf(r.changes)} first={r.rev === 1} />
              </td>
              <td className={`rc-lib-num${r.errors > 0 ? ' rc-lib-num--error' : ''}`}>{r.errors}</td>
              <td className={`rc-lib-num${r.warnings > 0 ? ' rc-lib-num--warning' : ''}`}>{r.warnings}</td>
              <td className="rc-lib-acts">
                <button
                  type="button"
                  data-action="restore"
                  disabled={r.rev === newest}
                  onClick={() => void session.restoreRevision(r.rev, false)}
                >
                  Restore
                </button>
                <button
                  type="button"
                  data-action="restore-copy"
                  onClick={() => void session.restoreRevision(r.rev, true)}
                >
                  Restore as copy
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}

/** How many changes a row shows before the rest fold away. */
const SHOWN = 3;

/** A revision's commands: the first few, the rest on request. */
function Changes({ list, first }: { list: readonly string[] | undefined; first: boolean }) {
  if (list === undefined || list.length === 0)
    return <span className="rc-muted">{first ? 'Created' : 'Not recorded'}</span>;
  const head = list.slice(0, SHOWN);
  const rest = list.slice(SHOWN);
  return (
    <>
      <ul className="rc-lib-change-list">
        {head.map((name, k) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: the same command may appear twice in one revision
          <li key={k}>{name}</li>
        ))}
      </ul>
      {rest.length > 0 && (
        <details className="rc-lib-more-changes">
          <summary>{rest.length} more</summary>
          <ul className="rc-lib-change-list">
            {rest.map((name, k) => (
              // biome-ignore lint/suspicious/noArrayIndexKey: the same command may appear twice in one revision
              <li key={k}>{name}</li>
            ))}
          </ul>
        </details>
      )}
    </>
  );
}
