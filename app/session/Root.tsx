/**
 * The page: the editor of the open design (remounted with a fresh store when another design
 * opens), and over it the library, the notices and the prompt for a conflict between tabs.
 */
import { useEffect } from 'react';
import { useStore } from 'zustand';
import { App } from '../App.tsx';
import { ConflictPrompt } from './ConflictPrompt.tsx';
import { LargePrompt } from './LargePrompt.tsx';
import { LibraryDialog } from './LibraryDialog.tsx';
import './library.css';
import { Notices } from './Notices.tsx';
import type { Session } from './session.ts';
import { SessionProvider } from './SessionProvider.tsx';
import { attachPageEvents } from './start.ts';
import { useFileDrop } from './useFileDrop.ts';

export function Root({ session }: { session: Session }) {
  const open = useStore(session.state, (s) => s.open);
  // A modal dialog makes the page behind it inert: notices then show inside the library.
  const modal = useStore(session.state, (s) => s.view !== null || s.large !== null);
  useEffect(() => attachPageEvents(session), [session]);
  useFileDrop(session);
  return (
    <SessionProvider session={session}>
      <App key={open.serial} store={open.store} saver={open.saver} />
      {!modal && <Notices />}
      <LibraryDialog />
      <ConflictPrompt />
      <LargePrompt />
    </SessionProvider>
  );
}
