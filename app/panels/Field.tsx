/**
 * Form fields that edit the design through commands: they keep what is being typed locally
 * and commit on Enter or on leaving the field; Escape puts the stored value back. A value the
 * parser or the command refuses stays in the field with the reason beside it; nothing is
 * stored.
 */
import { useId, useLayoutEffect, useRef, useState, type KeyboardEvent } from 'react';
import { formatQuantity, parseQuantity, type QuantityResult, type Unit } from '../../rules/levels/index.ts';
import type { Outcome } from '../store/editorStore.ts';
import { holdDraft } from './drafts.ts';
import { useEditor } from '../store/EditorProvider.tsx';

interface Editing {
  draft: string | null;
  error: string | null;
}

function useEditing(shown: string, commit: (text: string) => string | null) {
  const [state, setState] = useState<Editing>({ draft: null, error: null });
  const finish = () => {
    if (state.draft === null || state.draft === shown) {
      setState({ draft: null, error: null });
      return;
    }
    const error = commit(state.draft);
    setState(error === null ? { draft: null, error: null } : { draft: state.draft, error });
  };
  // A draft that differs from the stored value is committed if the page goes before Enter or blur.
  const latest = useRef(finish);
  latest.current = finish;
  const dirty = state.draft !== null && state.draft !== shown;
  useLayoutEffect(() => (dirty ? holdDraft(() => latest.current()) : undefined), [dirty]);
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') finish();
    if (e.key === 'Escape') setState({ draft: null, error: null });
  };
  return {
    value: state.draft ?? shown,
    error: state.error,
    onChange: (text: string) => setState({ draft: text, error: state.error }),
    onBlur: finish,
    onKeyDown,
  };
}

interface FieldProps {
  label: string;
  testId?: string;
  /** Hide the label visually (it stays the input's accessible name). */
  quiet?: boolean;
  /** Shown in the empty field: what applies when nothing is typed. */
  placeholder?: string;
  /** A longer description for assistive technology and the pointer's tooltip. */
  title?: string;
}

function Frame({
  label,
  quiet,
  error,
  errorId,
  children,
}: {
  label: string;
  quiet?: boolean | undefined;
  error: string | null;
  errorId: string;
  children: React.ReactNode;
}) {
  return (
    // biome-ignore lint/a11y/noLabelWithoutControl: the control is the child the caller passes in, wrapped by this label
    <label className={`rc-field${error !== null ? ' rc-field--invalid' : ''}`}>
      <span className={quiet === true ? 'rc-sr' : 'rc-field-label'}>{label}</span>
      {children}
      {error !== null && (
        <span className="rc-field-error" id={errorId} role="alert">
          {error}
        </span>
      )}
    </label>
  );
}

/** One edited text input in its frame: shows `shown`, commits through `commit` (null, or why not). */
function EditedInput({
  label,
  quiet,
  testId,
  placeholder,
  title,
  shown,
  commit,
  decimal,
}: FieldProps & {
  shown: string;
  commit: (text: string) => string | null;
  decimal?: boolean;
}) {
  const errorId = useId();
  const f = useEditing(shown, commit);
  // A design opened read-only takes no typing: nothing would be stored.
  const readOnly = useEditor((s) => s.readOnly);
  return (
    <Frame label={label} quiet={quiet} error={f.error} errorId={errorId}>
      <input
        type="text"
        inputMode={decimal === true ? 'decimal' : undefined}
        value={f.value}
        data-testid={testId}
        spellCheck={false}
        readOnly={readOnly}
        aria-invalid={f.error !== null}
        placeholder={placeholder}
        title={title}
        aria-describedby={f.error !== null ? errorId : undefined}
        onChange={(e) => f.onChange(e.target.value)}
        onBlur={f.onBlur}
        onKeyDown={f.onKeyDown}
      />
    </Frame>
  );
}

const reason = (out: Outcome): string | null => (out.ok ? null : out.reason);

export function TextField({
  value,
  onCommit,
  ...field
}: FieldProps & { value: string; onCommit: (text: string) => Outcome }) {
  return <EditedInput {...field} shown={value} commit={(text) => reason(onCommit(text))} />;
}

export interface QuantityFieldProps extends FieldProps {
  value: number;
  /** The unit the value is in; parsed with the engine's engineering-notation reader. */
  unit: Unit;
  onCommit: (value: number) => Outcome;
  /** Text shown for the stored value; default engineering notation with four digits. */
  format?: (value: number) => string;
  /** Text to value; default `parseQuantity(text, unit)`. */
  parse?: (text: string) => QuantityResult;
}

export function QuantityField({ value, unit, onCommit, format, parse, ...field }: QuantityFieldProps) {
  const shown = format !== undefined ? format(value) : formatQuantity(value, unit, 4);
  return (
    <EditedInput
      {...field}
      decimal
      shown={shown}
      commit={(text) => {
        const read = parse !== undefined ? parse(text) : parseQuantity(text, unit);
        return read.ok ? reason(onCommit(read.value)) : read.error;
      }}
    />
  );
}

/** A quantity that may be left empty: empty text stores nothing (`undefined`), and the placeholder says what applies then. */
export function OptionalQuantityField({
  value,
  unit,
  onCommit,
  ...field
}: FieldProps & {
  value: number | undefined;
  unit: Unit;
  onCommit: (value: number | undefined) => Outcome;
}) {
  return (
    <EditedInput
      {...field}
      decimal
      shown={value === undefined ? '' : formatQuantity(value, unit, 4)}
      commit={(text) => {
        if (text.trim() === '') return reason(onCommit(undefined));
        const read = parseQuantity(text, unit);
        return read.ok ? reason(onCommit(read.value)) : read.error;
      }}
    />
  );
}
