/**
 * A pin's effective parameters, each with where it comes from: the pin's override, the part's
 * override, or the profile (named, with the source of its numbers). Levels of VDD are also
 * shown at the rail's nominal voltage.
 */
import { resolvePin } from '../../rules/engine/index.ts';
import { levelAt, type Level } from '../../rules/levels/index.ts';
import { formatQuantity } from '../../rules/levels/index.ts';
import type { Part, Pin } from '../../rules/model/index.ts';
import { useEditor } from '../store/EditorProvider.tsx';
import { formatParam, PARAM_FIELDS } from '../store/paramFields.ts';

const LEVEL_KEYS = new Set(['vih', 'vil', 'viMax']);

export function PinEffective({ part, pin }: { part: Part; pin: Pin }) {
  const design = useEditor((s) => s.design);
  const r = resolvePin(design, part, pin);
  const rail = design.rails.find((x) => x.id === r.rail);
  const profile = r.profile;
  const fromProfile = profile === undefined ? `profile ${r.profileId} (unknown)` : `profile ${profile.label}`;
  const rows = PARAM_FIELDS.filter((f) => r.params[f.key] !== undefined);
  return (
    <div className="rc-pin-effective" data-testid={`pin-effective-${pin.id}`}>
      <p className="rc-muted">
        Rail {rail?.label ?? r.rail}
        {pin.rail !== undefined ? " (the pin's own)" : ''}; {fromProfile}
        {pin.profile !== undefined ? " (the pin's own)" : ''}.
        {profile !== undefined && (
          <>
            {' '}
            Source of the profile: <span className="rc-source">{profile.source}</span>
          </>
        )}
      </p>
      {rows.length === 0 ? (
        <p className="rc-muted">No parameters: the profile gives none.</p>
      ) : (
        <table className="rc-effective" aria-label={`Effective parameters of ${r.key}`}>
          <thead>
            <tr>
              <th scope="col">Parameter</th>
              <th scope="col">Value</th>
              <th scope="col">From</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((f) => {
              const value = r.params[f.key];
              const origin = r.origin[f.key];
              const atRail =
                LEVEL_KEYS.has(f.key) && typeof value === 'string' && rail !== undefined
                  ? ` = ${formatQuantity(levelAt(value as Level, rail.nominal), 'V', 3)} at ${formatQuantity(rail.nominal, 'V')}`
                  : '';
              return (
                <tr key={f.key} data-param={f.key} data-origin={origin}>
                  <th scope="row">
                    <abbr title={f.meaning}>{f.label}</abbr>
                  </th>
                  <td className="rc-mono">
                    {formatParam(f.key, value)}
                    {atRail}
                  </td>
                  <td className={`rc-origin rc-origin--${origin}`}>
                    {origin === 'pin' ? 'pin override' : origin === 'part' ? 'part override' : fromProfile}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
    </div>
  );
}
