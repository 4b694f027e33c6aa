/**
 * The names people read: a net by its label, a rail by its label, a profile by its label. Ids
 * stay in the machine fields (finding ids, `net`, values, SARIF locations); every sentence a
 * person reads names things as the editor shows them (one name for one thing).
 */
import type { Design, Net } from '../model/schema.ts';
import { GROUND } from '../model/references.ts';
import { resolveProfile } from '../profiles/index.ts';

/** A label when it says something, else the id. */
export function labelOr(label: string | undefined, id: string): string {
  return label === undefined || label.trim() === '' ? id : label;
}

/** The name of a net as people see it. */
export function netLabel(net: Net): string {
  return labelOr(net.label, net.id);
}

const railMaps = new WeakMap<Design['rails'], ReadonlyMap<string, string>>();

/** Rail id → label, cached by the rails array (immer keeps it while no rail changes). */
function railLabels(rails: Design['rails']): ReadonlyMap<string, string> {
  let map = railMaps.get(rails);
  if (map === undefined) {
    map = new Map(rails.map((r) => [r.id, labelOr(r.label, r.id)]));
    railMaps.set(rails, map);
  }
  return map;
}

/**
 * The names of a design. `nets` is the engine's index of nets by id when there is one (an
 * incremental check keeps it current); without it a map is built on first use. The state sits in
 * private fields: freezing a view (the rule tester does) leaves the maps alone, and two views
 * compare equal whatever design their names were taken from.
 */
export class Names {
  readonly #design: Design;
  #nets: ReadonlyMap<string, Net> | undefined;
  readonly #rails: ReadonlyMap<string, string>;

  constructor(design: Design, nets?: ReadonlyMap<string, Net>) {
    this.#design = design;
    this.#nets = nets;
    this.#rails = railLabels(design.rails);
  }

  /** A net's label, else its id. */
  net(id: string): string {
    this.#nets ??= new Map(this.#design.nets.map((n) => [n.id, n]));
    const n = this.#nets.get(id);
    return n === undefined ? id : netLabel(n);
  }

  /** A rail's label, else its id; `ground` stays `ground`. */
  rail(id: string): string {
    if (id === GROUND) return GROUND;
    return this.#rails.get(id) ?? id;
  }

  /** A profile's label (design-local or built-in), else its id. */
  profile(id: string): string {
    const p = resolveProfile(this.#design, id);
    return p === undefined ? id : labelOr(p.label, id);
  }
}

/** The names of a design (see {@link Names}). */
export function namesOf(design: Design, nets?: ReadonlyMap<string, Net>): Names {
  return new Names(design, nets);
}
