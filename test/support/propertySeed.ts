/**
 * The property tests' randomness. `npm test` gates every change, so it draws the same cases
 * on every machine: a failure there is the change's, never the day's luck, and it reproduces.
 * `npm run fuzz` sets RAILCROSS_FUZZ to explore fresh cases; a failure then prints its seed,
 * and RAILCROSS_SEED=<seed> replays it.
 */
import fc from 'fast-check';

const FIXED_SEED = 20_261_202;

const replay = process.env.RAILCROSS_SEED;
if (replay !== undefined && replay !== '') fc.configureGlobal({ seed: Number(replay) });
else if (!process.env.RAILCROSS_FUZZ) fc.configureGlobal({ seed: FIXED_SEED });
