import type { Rng } from './rng.ts';
import { createRng } from './createRng.ts';
import { seedFor } from './seedFor.ts';
import { standardNormal } from './standardNormal.ts';

/**
 * One object's Monte Carlo deviates, kept by role ('lum_halpha', 'width_halpha', 'dust_av', …).
 * Each role has its own stream, seeded from the object's stream and the role's name, so a
 * role's deviates do not depend on which other roles were drawn, or in what order. A reading
 * that uses the same measurement, or a rescaled one (a deflated width), sees the same deviates
 * as every other reading: comparisons between readings are paired draw by draw, and the
 * deviates are made once per object however many readings use them.
 */
export interface DrawBank {
  /** Draws per role. */
  readonly n: number;
  /** `n` standard normal deviates of `role` (the same array on every call until the next reset; do not modify). */
  normals(role: string): Float64Array;
  /** `n` uniform deviates in [0, 1) of `role`, independent of its normals (do not modify). */
  uniforms(role: string): Float64Array;
  /** A fresh stream for `role`'s rare redraws (a positive quantity drawn ≤ 0): the same stream on every call. */
  redraws(role: string): Rng;
}

interface Slot {
  normals: Float64Array | null;
  uniforms: Float64Array | null;
  /** Generation at which each array was last filled (the bank's generation when current). */
  normalsAt: number;
  uniformsAt: number;
}

/** A DrawBank whose arrays are reused from object to object (reset per object): no allocation in the hot path. */
export class ReusableDrawBank implements DrawBank {
  private slots = new Map<string, Slot>();
  private generation = 0;
  private base = 0;
  private draws = 0;

  get n(): number {
    return this.draws;
  }

  /**
   * Starts a new object: its deviates come from `rng` (two 32-bit words are taken as the base
   * seed of every role) and number `n` per role.
   */
  reset(rng: Rng, n: number): this {
    const lo = rng.nextUint32();
    const hi = rng.nextUint32() & 0x1fffff;
    this.base = hi * 4294967296 + lo;
    this.generation++;
    if (n !== this.draws) {
      this.slots.clear();
      this.draws = n;
    }
    return this;
  }

  private slot(role: string): Slot {
    let s = this.slots.get(role);
    if (!s) {
      s = { normals: null, uniforms: null, normalsAt: -1, uniformsAt: -1 };
      this.slots.set(role, s);
    }
    return s;
  }

  normals(role: string): Float64Array {
    const s = this.slot(role);
    if (s.normalsAt !== this.generation) {
      const rng = createRng(seedFor(this.base, role));
      const z = (s.normals ??= new Float64Array(this.draws));
      for (let k = 0; k < z.length; k++) z[k] = standardNormal(rng);
      s.normalsAt = this.generation;
    }
    return s.normals as Float64Array;
  }

  uniforms(role: string): Float64Array {
    const s = this.slot(role);
    if (s.uniformsAt !== this.generation) {
      const rng = createRng(seedFor(this.base, `${role}:side`));
      const u = (s.uniforms ??= new Float64Array(this.draws));
      for (let k = 0; k < u.length; k++) u[k] = rng.next();
      s.uniformsAt = this.generation;
    }
    return s.uniforms as Float64Array;
  }

  redraws(role: string): Rng {
    return createRng(seedFor(this.base, `${role}:redraw`));
  }
}

/** A bank of `n` deviates per role for one object, from its stream `rng`. */
export function createDrawBank(rng: Rng, n: number): DrawBank {
  return new ReusableDrawBank().reset(rng, n);
}

/** True for a DrawBank (as opposed to a plain random stream). */
export function isDrawBank(x: Rng | DrawBank): x is DrawBank {
  return typeof (x as DrawBank).normals === 'function';
}
