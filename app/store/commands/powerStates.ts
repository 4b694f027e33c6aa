import type { PinState } from '../../../rules/model/index.ts';
import { refuse, type Command, freshId } from './command.ts';

/** A new power state (scenario) with every rail on; id `S<k>`. */
export function addPowerState(label?: string): Command {
  return {
    name: 'Add a power state',
    recipe(design) {
      const taken = (design.scenarios ?? []).map((s) => s.id);
      const id = freshId('S', taken);
      const scenario = { id, label: label ?? `Power state ${id}`, off: [] };
      if (design.scenarios === undefined) design.scenarios = [scenario];
      else design.scenarios.push(scenario);
    },
  };
}

export function setPowerStateLabel(id: string, label: string): Command {
  return {
    name: `Rename power state ${id}`,
    recipe(design) {
      const s = design.scenarios?.find((x) => x.id === id);
      if (s === undefined) return refuse(`There is no power state ${id}.`);
      s.label = label;
    },
  };
}

/** Turn a rail off (or back on) in a power state. */
export function setRailOff(stateId: string, railId: string, off: boolean): Command {
  return {
    name: `${off ? 'Turn off' : 'Turn on'} rail ${railId} in ${stateId}`,
    recipe(design) {
      const s = design.scenarios?.find((x) => x.id === stateId);
      if (s === undefined) return refuse(`There is no power state ${stateId}.`);
      if (!design.rails.some((r) => r.id === railId)) return refuse(`There is no rail ${railId}.`);
      const has = s.off.includes(railId);
      if (off && !has) s.off.push(railId);
      if (!off && has) s.off = s.off.filter((r) => r !== railId);
    },
  };
}

/** Delete a power state, and the waivers that named it (they would name nothing). */
export function deletePowerState(id: string): Command {
  return {
    name: `Delete power state ${id}`,
    recipe(design) {
      const list = design.scenarios ?? [];
      if (!list.some((s) => s.id === id)) return refuse(`There is no power state ${id}.`);
      design.scenarios = list.filter((s) => s.id !== id);
      if (design.scenarios.length === 0) delete design.scenarios;
      for (const net of design.nets) {
        if (net.waivers === undefined) continue;
        net.waivers = net.waivers.filter((w) => w.scenario !== id);
        if (net.waivers.length === 0) delete net.waivers;
      }
    },
  };
}

/** The power state that holds parts' pins as they are before firmware runs. */
export const RESET_STATE_ID = 'reset';
export const RESET_STATE_LABEL = 'Reset: firmware not yet running';

/**
 * One click for a part's reset state: in the `reset` power state (made, every rail on, when
 * missing), each of the part's outputs and bidir pins becomes an input (a controller's
 * programmable pins are inputs until firmware sets them), keeping any internal pull it has;
 * pins the state already sets are left as they are. Refused for a part with no output.
 */
export function setResetState(partId: string): Command {
  return {
    name: `Reset state of ${partId}`,
    recipe(design) {
      const part = design.parts.find((p) => p.id === partId);
      if (part === undefined) return refuse(`There is no part ${partId}.`);
      const outputs = part.pins.filter((p) => p.role !== 'input');
      if (outputs.length === 0) return refuse(`${partId} has no output or bidir pin to make an input.`);
      let state = design.scenarios?.find((s) => s.id === RESET_STATE_ID);
      if (state === undefined) {
        state = { id: RESET_STATE_ID, label: RESET_STATE_LABEL, off: [] };
        if (design.scenarios === undefined) design.scenarios = [state];
        else design.scenarios.push(state);
        state = design.scenarios[design.scenarios.length - 1]!;
      }
      const set = new Set((state.pins ?? []).map((p) => p.pin));
      const added: PinState[] = outputs
        .filter((p) => !set.has(`${partId}.${p.id}`))
        .map((p) => ({ pin: `${partId}.${p.id}`, role: 'input' }));
      if (added.length === 0) return;
      state.pins = [...(state.pins ?? []), ...added];
    },
  };
}
