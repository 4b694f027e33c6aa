import { shortcutList } from '../keys/registry.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import { Modal } from './Modal.tsx';

/** The list of keyboard shortcuts ("?"). */
export function ShortcutsDialog() {
  const store = useEditorStore();
  const close = () => store.getState().openDialog(null);
  return (
    <Modal title="Keyboard shortcuts" onClose={close} testId="shortcuts">
      <p className="rc-muted">Ctrl stands for Cmd on a Mac. Keys typed into a field belong to the field.</p>
      {shortcutList()
        .filter((g) => g.items.length > 0)
        .map((g) => (
          <section key={g.group} className="rc-keys">
            <h3>{g.group}</h3>
            <dl>
              {g.items.map((s) => (
                <div key={s.does} className="rc-keys-row" data-command={s.command}>
                  <dt>
                    {s.keys.map((k, i) => (
                      <span key={k}>
                        {i > 0 && ' or '}
                        <kbd>{k}</kbd>
                      </span>
                    ))}
                  </dt>
                  <dd>{s.does}</dd>
                </div>
              ))}
            </dl>
          </section>
        ))}
      <button type="button" data-autofocus onClick={close}>
        Close
      </button>
    </Modal>
  );
}
