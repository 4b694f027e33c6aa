/**
 * What `npm run bench:ui` drives the editor through: the session (to open a design as the
 * library does) and the commands. Loaded only when the address has `?bench`; the normal page
 * never fetches this chunk.
 */
import * as commands from '../store/commands/index.ts';

export function exposeForBench(session: object): void {
  (window as unknown as { __railcrossBench: unknown }).__railcrossBench = { session, commands };
}
