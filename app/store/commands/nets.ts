import type { Pull } from '../../../rules/model/index.ts';
import { GROUND } from '../../../rules/model/index.ts';
import { MAX_FARADS, MAX_OHMS, MAX_SECONDS, MIN_FARADS, MIN_OHMS, MIN_SECONDS } from '../../../rules/model/index.ts';
import { refuse, type Command } from './command.ts';

export function setNetLabel(id: string, label: string): Command {
  return {
    name: `Label net ${id}`,
    recipe(design) {
      const net = design.nets.find((n) => n.id === id);
      if (net === undefined) return refuse(`There is no net ${id}.`);
      const text = label.trim();
      if (text === '') delete net.label;
      else net.label = text;
    },
  };
}

/** Give a net an external pull resistor, or take it away (`null`). */
export function setNetPull(id: string, pull: Pull | null): Command {
  return {
    name: pull === null ? `Remove the pull of net ${id}` : `Pull net ${id}`,
    recipe(design) {
      const net = design.nets.find((n) => n.id === id);
      if (net === undefined) return refuse(`There is no net ${id}.`);
      if (pull === null) {
        delete net.pull;
        return;
      }
      if (!(pull.ohms >= MIN_OHMS && pull.ohms <= MAX_OHMS))
        return refuse('A pull resistor needs a positive value in Ω, from 1 mΩ to 1 TΩ.');
      if (pull.to !== GROUND && !design.rails.some((r) => r.id === pull.to))
        return refuse(`There is no rail ${pull.to}.`);
      net.pull = { to: pull.to, ohms: pull.ohms };
    },
  };
}

/** The net's own wiring capacitance (F), or the design's default again (`undefined`). */
export function setNetWiringCapacitance(id: string, farads: number | undefined): Command {
  return {
    name: `Set the wiring capacitance of net ${id}`,
    recipe(design) {
      const net = design.nets.find((n) => n.id === id);
      if (net === undefined) return refuse(`There is no net ${id}.`);
      if (farads === undefined) {
        delete net.wiringCapacitance;
        return;
      }
      if (!(farads === 0 || (farads >= MIN_FARADS && farads <= MAX_FARADS)))
        return refuse('A capacitance is 0 F or more: 0, or from 1 aF to 1 F.');
      net.wiringCapacitance = farads;
    },
  };
}

/** The slowest acceptable rise time (s), or no limit (`undefined`). */
export function setNetMaxRiseTime(id: string, seconds: number | undefined): Command {
  return {
    name: `Set the rise-time limit of net ${id}`,
    recipe(design) {
      const net = design.nets.find((n) => n.id === id);
      if (net === undefined) return refuse(`There is no net ${id}.`);
      if (seconds === undefined) {
        delete net.maxRiseTime;
        return;
      }
      if (!(seconds >= MIN_SECONDS && seconds <= MAX_SECONDS))
        return refuse('A rise-time limit is a time above 0 s, from 1 fs to 1 s.');
      net.maxRiseTime = seconds;
    },
  };
}
