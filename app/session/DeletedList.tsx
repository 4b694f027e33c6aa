/** Recently deleted designs: restorable until 30 days after their deletion, then purged on start. */
import type { DesignRecord } from '../storage/db.ts';
import { DELETED_KEPT_MS } from '../storage/library.ts';
import { useSession } from './SessionProvider.tsx';
import { daysLeft, fullWhen, shortWhen } from './when.ts';

export function DeletedList({ deleted }: { deleted: readonly DesignRecord[] }) {
  const session = useSession();
  if (deleted.length === 0) return <p className="rc-empty">Nothing deleted in the last 30 days.</p>;
  return (
    <table className="rc-lib-table" data-testid="deleted-list">
      <thead>
        <tr>
          <th>Design</th>
          <th className="rc-lib-when">Deleted</th>
          <th className="rc-lib-when">Kept for</th>
          <th className="rc-lib-acts">
            <span className="rc-sr">Actions</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {deleted.map((d) => {
          const at = d.deletedAt ?? 0;
          return (
            <tr key={d.id} className="rc-lib-row" data-testid="deleted-row" data-design={d.id} data-title={d.title}>
              <td className="rc-lib-title">{d.title === '' ? '(untitled)' : d.title}</td>
              <td className="rc-lib-when" title={fullWhen(at)}>
                {shortWhen(at)}
              </td>
              <td className="rc-lib-when" title={`Until ${fullWhen(at + DELETED_KEPT_MS)}`}>
                {daysLeft(at + DELETED_KEPT_MS)}
              </td>
              <td className="rc-lib-acts">
                <button type="button" data-action="restore" onClick={() => void session.restore(d.id)}>
                  Restore
                </button>
                <button
                  type="button"
                  data-action="purge"
                  title="Delete this design and all its revisions now; this cannot be undone"
                  onClick={() => {
                    if (confirm(`Delete “${d.title}” and all its saved revisions for good? This cannot be undone.`))
                      void session.purge(d.id);
                  }}
                >
                  Delete now
                </button>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
