/**
 * The pin table of a chip: one row per pin (id, role, drive, side, rail, profile), each with
 * its parameter overrides folded beneath it.
 */
import { Fragment, useState } from 'react';
import type { Design, Pin } from '../../../rules/model/index.ts';
import { withParam } from '../../store/paramFields.ts';
import { ParamEditor } from '../ParamEditor.tsx';
import { ProfileOptions } from '../ProfileOptions.tsx';
import { addRow, moveRow, removeRow, rowProblems, setRow, type ChipDraft } from './chipDraft.ts';
import { inheritedParam } from './inherited.ts';
import { profileIdOf } from '../../../rules/model/index.ts';

const DRIVE_DEFAULT: Readonly<Record<Pin['role'], string>> = { input: '—', output: 'push-pull', bidir: 'three-state' };

export function PinTable({
  design,
  draft,
  onChange,
}: {
  design: Design;
  draft: ChipDraft;
  onChange: (next: ChipDraft) => void;
}) {
  const [open, setOpen] = useState<number | null>(null);
  const problems = rowProblems(draft);
  const set = (key: number, patch: Partial<Pin>) => onChange(setRow(draft, key, patch));
  return (
    <div className="rc-pin-table-wrap">
      <table className="rc-pin-table" aria-label="Pins" data-testid="pin-table">
        <thead>
          <tr>
            <th scope="col">Pin</th>
            <th scope="col">Role</th>
            <th scope="col">Drive</th>
            <th scope="col">Side</th>
            <th scope="col">Rail</th>
            <th scope="col">Profile</th>
            <th scope="col">Parameters</th>
            <th scope="col">
              <span className="rc-sr">Order and removal</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {draft.rows.map((row, k) => {
            const { pin } = row;
            const name = pin.id === '' ? `row ${k + 1}` : pin.id;
            const overrides = Object.keys(pin.params ?? {}).length;
            const problem = problems.get(row.key);
            const expanded = open === row.key;
            return (
              <Fragment key={row.key}>
                <tr data-row={k} className={problem !== undefined ? 'rc-row--invalid' : undefined}>
                  <td>
                    <input
                      type="text"
                      className="rc-pin-id"
                      value={pin.id}
                      aria-label={`Id of pin ${k + 1}`}
                      data-testid={`pin-${k}-id`}
                      spellCheck={false}
                      aria-invalid={problem !== undefined}
                      onChange={(e) => set(row.key, { id: e.target.value.trim() })}
                    />
                    {problem !== undefined && (
                      <div className="rc-field-error" role="alert">
                        {problem}
                      </div>
                    )}
                  </td>
                  <td>
                    <select
                      value={pin.role}
                      aria-label={`Role of pin ${name}`}
                      data-testid={`pin-${k}-role`}
                      onChange={(e) =>
                        set(row.key, {
                          role: e.target.value as Pin['role'],
                          ...(e.target.value === 'input' ? { drive: undefined } : {}),
                        })
                      }
                    >
                      <option value="input">input</option>
                      <option value="output">output</option>
                      <option value="bidir">bidir</option>
                    </select>
                  </td>
                  <td>
                    <select
                      value={pin.drive ?? ''}
                      aria-label={`Drive of pin ${name}`}
                      data-testid={`pin-${k}-drive`}
                      disabled={pin.role === 'input'}
                      onChange={(e) =>
                        set(row.key, { drive: e.target.value === '' ? undefined : (e.target.value as Pin['drive']) })
                      }
                    >
                      <option value="">{pin.role === 'input' ? '—' : `default (${DRIVE_DEFAULT[pin.role]})`}</option>
                      <option value="push-pull">push-pull</option>
                      <option value="three-state">three-state</option>
                      <option value="open-drain">open-drain</option>
                    </select>
                  </td>
                  <td>
                    <select
                      value={pin.side ?? ''}
                      aria-label={`Side of pin ${name}`}
                      data-testid={`pin-${k}-side`}
                      onChange={(e) =>
                        set(row.key, { side: e.target.value === '' ? undefined : (e.target.value as Pin['side']) })
                      }
                    >
                      <option value="">auto</option>
                      <option value="left">left</option>
                      <option value="right">right</option>
                      <option value="top">top</option>
                      <option value="bottom">bottom</option>
                    </select>
                  </td>
                  <td>
                    <select
                      value={pin.rail ?? ''}
                      aria-label={`Rail of pin ${name}`}
                      data-testid={`pin-${k}-rail`}
                      onChange={(e) => set(row.key, { rail: e.target.value === '' ? undefined : e.target.value })}
                    >
                      <option value="">the part's</option>
                      {design.rails.map((r) => (
                        <option key={r.id} value={r.id}>
                          {r.label}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td>
                    <select
                      value={pin.profile ?? ''}
                      aria-label={`Profile of pin ${name}`}
                      data-testid={`pin-${k}-profile`}
                      onChange={(e) => set(row.key, { profile: e.target.value === '' ? undefined : e.target.value })}
                    >
                      <option value="">the part's</option>
                      <ProfileOptions local={design.profiles} />
                    </select>
                  </td>
                  <td>
                    <button
                      type="button"
                      aria-expanded={expanded}
                      aria-controls={`pin-params-${row.key}`}
                      data-testid={`pin-${k}-params`}
                      onClick={() => setOpen(expanded ? null : row.key)}
                    >
                      {overrides === 0 ? 'Override…' : `${overrides} override${overrides === 1 ? '' : 's'}`}
                    </button>
                  </td>
                  <td className="rc-row-tools">
                    <button
                      type="button"
                      className="rc-icon-btn"
                      aria-label={`Move pin ${name} up`}
                      disabled={k === 0}
                      onClick={() => onChange(moveRow(draft, row.key, -1))}
                    >
                      ↑
                    </button>
                    <button
                      type="button"
                      className="rc-icon-btn"
                      aria-label={`Move pin ${name} down`}
                      disabled={k === draft.rows.length - 1}
                      onClick={() => onChange(moveRow(draft, row.key, 1))}
                    >
                      ↓
                    </button>
                    <button
                      type="button"
                      className="rc-icon-btn"
                      aria-label={`Remove pin ${name}`}
                      data-testid={`pin-${k}-remove`}
                      onClick={() => onChange(removeRow(draft, row.key))}
                    >
                      ×
                    </button>
                  </td>
                </tr>
                {expanded && (
                  <tr className="rc-pin-params-row" id={`pin-params-${row.key}`}>
                    <td colSpan={8}>
                      <ParamEditor
                        params={pin.params}
                        label={`Overrides of pin ${name}`}
                        testId={`pin-${k}-param`}
                        fallback={(key) => inheritedParam(design, draft.part.params, profileIdOf(draft.part, pin), key)}
                        onChange={(key, value) => {
                          set(row.key, { params: withParam(pin.params, key, value) });
                          return { ok: true, changed: true };
                        }}
                      />
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
      {draft.rows.length === 0 && (
        <p className="rc-empty">
          No pins yet: add one for each signal pin (supply and ground are implied by the rail).
        </p>
      )}
      <button type="button" className="rc-add" data-testid="pin-add" onClick={() => onChange(addRow(draft))}>
        Add a pin
      </button>
    </div>
  );
}
