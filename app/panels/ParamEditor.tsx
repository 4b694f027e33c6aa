/**
 * Parameter overrides as a table: one row per parameter, typed in engineering notation with
 * units or as a Level of VDD; an empty field means "no override", and the last column says
 * what applies then and where it comes from.
 */
import type { Params } from '../../rules/model/index.ts';
import type { Outcome } from '../store/editorStore.ts';
import { formatParam, parseParam, PARAM_FIELDS, type ParamKey } from '../store/paramFields.ts';
import { TextField } from './Field.tsx';

export interface Fallback {
  readonly text: string;
  readonly from: string;
}

export function ParamEditor({
  params,
  onChange,
  fallback,
  label,
  testId,
  valueHeading = 'Override',
}: {
  params: Params | undefined;
  /** Store a value, or take the key away (`undefined`). */
  onChange: (key: ParamKey, value: unknown) => Outcome;
  /** What applies without this table's value; no last column when absent. */
  fallback?: (key: ParamKey) => Fallback | undefined;
  /** The table's accessible name, e.g. "Overrides of pin A". */
  label: string;
  testId: string;
  valueHeading?: string;
}) {
  return (
    <table className="rc-params" aria-label={label} data-testid={testId}>
      <thead>
        <tr>
          <th scope="col">Parameter</th>
          <th scope="col">{valueHeading}</th>
          {fallback !== undefined && <th scope="col">Otherwise</th>}
        </tr>
      </thead>
      <tbody>
        {PARAM_FIELDS.map((field) => {
          const value = params?.[field.key];
          const other = fallback?.(field.key);
          return (
            <tr key={field.key} data-param={field.key}>
              <th scope="row">
                <abbr title={field.meaning}>{field.label}</abbr>
              </th>
              <td>
                <TextField
                  quiet
                  label={`${field.label}, ${field.meaning}`}
                  title={`${field.meaning}; e.g. ${field.example}`}
                  value={formatParam(field.key, value)}
                  placeholder={other?.text ?? field.example}
                  testId={`${testId}-${field.key}`}
                  onCommit={(text) => {
                    if (text.trim() === '') return onChange(field.key, undefined);
                    const read = parseParam(field.key, text);
                    return read.ok ? onChange(field.key, read.value) : { ok: false, reason: read.error };
                  }}
                />
              </td>
              {fallback !== undefined && (
                <td className="rc-param-from">
                  {other === undefined ? (
                    <span className="rc-muted">not given</span>
                  ) : (
                    <>
                      <span className="rc-mono">{other.text}</span> <span className="rc-muted">{other.from}</span>
                    </>
                  )}
                </td>
              )}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
