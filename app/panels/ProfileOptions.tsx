import type { Profile } from '../../rules/model/index.ts';
import { BUILTIN_PROFILES } from '../../rules/profiles/index.ts';

/** The `<option>`s of a profile choice: this design's profiles first, then the library's they do not shadow. */
export function ProfileOptions({ local }: { local: readonly Profile[] | undefined }) {
  return (
    <>
      {local !== undefined && local.length > 0 && (
        <optgroup label="This design">
          {local.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </optgroup>
      )}
      <optgroup label="Library">
        {BUILTIN_PROFILES.filter((p) => !local?.some((l) => l.id === p.id)).map((p) => (
          <option key={p.id} value={p.id}>
            {p.label}
          </option>
        ))}
      </optgroup>
    </>
  );
}
