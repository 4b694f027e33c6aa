/** Checks over a list of key commands, kept apart from the list so that tests can run them on lists of their own. */
import { chordName, parseChord, type KeyCommand } from './registry.ts';

/** Every key bound more than once, with the commands that claim it (a key written twice in one command counts too). */
export function doubleBound(
  commands: readonly Pick<KeyCommand, 'id' | 'keys'>[],
  gestures: readonly { readonly keys: readonly string[] }[] = [],
): string[] {
  const owners = new Map<string, string[]>();
  for (const c of commands)
    for (const k of c.keys) {
      const name = chordName(parseChord(k));
      owners.set(name, [...(owners.get(name) ?? []), c.id]);
    }
  // A key the browser or React Flow already uses for a gesture (Tab) is taken too.
  for (const g of gestures)
    for (const k of g.keys)
      if (!/Click|Drag/.test(k)) {
        const name = chordName(parseChord(k));
        owners.set(name, [...(owners.get(name) ?? []), 'gesture']);
      }
  return [...owners].filter(([, ids]) => ids.length > 1).map(([name, ids]) => `${name}: ${ids.join(', ')}`);
}
