/** Severity shown by shape as well as colour: a notched diamond for an error, a hollow triangle for a warning, a ring for information. */
import type { Severity } from '../../rules/engine/index.ts';

export function SeverityGlyph({ severity, size = 12 }: { severity: Severity | 'clean'; size?: number }) {
  if (severity === 'clean') return null;
  return (
    <svg
      className={`rc-sev rc-sev--${severity}`}
      viewBox="0 0 12 12"
      width={size}
      height={size}
      aria-label={severity}
      role="img"
    >
      {severity === 'error' && (
        <>
          <path d="M6 0.5 L11.5 6 L6 11.5 L0.5 6 Z" className="s-fill" />
          <path d="M6 3 V6.8 M6 8.3 V9" className="s-mark" />
        </>
      )}
      {severity === 'warning' && <path d="M6 1.2 L11.2 10.5 H0.8 Z" className="s-hollow" />}
      {severity === 'info' && <circle cx="6" cy="6" r="4.2" className="s-hollow" />}
    </svg>
  );
}
