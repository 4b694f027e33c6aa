import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Session } from '../../../app/session/session.ts';
import { startSession } from '../../../app/session/start.ts';
import { setTitle } from '../../../app/store/commands/index.ts';
import { dbName, tab } from './sessionSupport.ts';

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

async function edit(session: Session, title: string): Promise<void> {
  session.editor.getState().apply(setTitle(title));
  await session.flush();
}

const notice = (session: Session, key: string) => session.state.getState().notices.find((n) => n.key === key);

describe('when storage fails, the design stays in memory and export is offered', () => {
  it('no IndexedDB at all: the editor opens the example, says why, and offers an export', async () => {
    vi.stubGlobal('indexedDB', undefined);
    const session = await startSession();
    expect(session.library).toBeNull();
    expect(session.state.getState().storageError).toBe('this browser offers no IndexedDB');
    expect(notice(session, 'storage')?.actions?.map((a) => a.label)).toEqual(['Export design file']);
    await edit(session, 'Kept in memory');
    expect(session.editor.getState().design.title).toBe('Kept in memory');
    const status = session.state.getState().open.saver.status;
    expect(status.state === 'failed' && status.error).toContain('nothing can be stored in this browser');
    session.close();
  });

  it.each([
    {
      name: 'the storage quota is used up',
      fail: (s: Session) =>
        vi
          .spyOn(s.library!, 'save')
          .mockRejectedValue(new DOMException('The quota has been exceeded.', 'QuotaExceededError')),
      why: "the browser's storage for this site is full",
    },
    {
      name: 'another tab upgraded the database and closed it here',
      fail: (s: Session) => s.library!.db.close(),
      why: 'another tab opened a newer version of Railcross',
    },
  ])('a failed write ($name): a clear message, the design kept, export and retry offered', async ({ fail, why }) => {
    const session = await tab(dbName());
    fail(session);
    await edit(session, 'Not yet stored');

    expect(session.editor.getState().design.title).toBe('Not yet stored');
    const status = session.state.getState().open.saver.status;
    expect(status.state === 'failed' && status.error).toContain(why);
    const n = notice(session, 'save');
    expect(n?.lines[0]).toContain(why);
    expect(n?.actions?.map((a) => a.label)).toEqual(['Export design file', 'Try again']);
    expect(session.state.getState().open.saver.unsaved).toBe(true);
  });

  it('"Try again" stores the kept design once storage works again, and the message goes', async () => {
    const session = await tab(dbName());
    const spy = vi
      .spyOn(session.library!, 'save')
      .mockRejectedValueOnce(new DOMException('full', 'QuotaExceededError'));
    await edit(session, 'Stored at the second try');
    expect(notice(session, 'save')).toBeDefined();
    notice(session, 'save')
      ?.actions?.find((a) => a.label === 'Try again')
      ?.run();
    await session.flush();
    expect(spy).toHaveBeenCalledTimes(2);
    expect(session.state.getState().open.saver.status).toEqual({ state: 'saved' });
    expect(notice(session, 'save')).toBeUndefined();
    const opened = await session.library!.open(session.openId!);
    expect(opened.ok && opened.design.title).toBe('Stored at the second try');
  });
});
