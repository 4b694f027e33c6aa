/** The open dialog, if any: the pin table of a chip, the list of shortcuts, or the search box. */
import { useEditor } from '../store/EditorProvider.tsx';
import { ChipDialog } from './chip/ChipDialog.tsx';
import { ShortcutsDialog } from './ShortcutsDialog.tsx';
import { SearchDialog } from '../search/SearchDialog.tsx';

export function Dialogs() {
  const dialog = useEditor((s) => s.dialog);
  if (dialog === null) return null;
  if (dialog.kind === 'chip') return <ChipDialog key={dialog.part ?? '(new)'} partId={dialog.part} />;
  if (dialog.kind === 'keys') return <ShortcutsDialog />;
  return <SearchDialog />;
}
