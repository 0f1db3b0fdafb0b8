import type { Rng } from './rng.ts';
import { createRng } from './createRng.ts';
import { seedFor } from './seedFor.ts';
import { fillStandardNormals } from './standardNormal.ts';

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
  /** Changes whenever the bank moves to another object's deviates. */
  readonly generation: number;
  /** `n` standard normal deviates of `role` (the same array on every call until the next reset; do not modify). */
  normals(role: string): Float64Array;
  /** `n` uniform deviates in [0, 1) of `role`, independent of its normals (do not modify). */
  uniforms(role: string): Float64Array;
  /** A fresh stream for `role`'s rare redraws (a positive quantity drawn ≤ 0): the same stream on every call. */
  redraws(role: string): Rng;
  /**
   * `n` values made from this object's deviates of `role` and a measurement described by `key`
   * (e.g. the log10 of a width's draws): filled by `fill` on the first request for this object,
   * then the same array for every later request with an equal key, so readings that use the
   * same measurement compute its transform once. `fill` must be a pure function of the deviates
   * and the key. The array is the bank's (do not modify; copy it before asking for more): it
   * stays valid until the next object, or until four other keys of the role were asked for.
   */
  derived(role: string, key: DerivedKey, fill: (out: Float64Array) => void): Float64Array;
}

/** What a derived array depends on besides the deviates: a measurement's value, errors and kind. */
export interface DerivedKey {
  readonly value: number;
  readonly errLo: number;
  readonly errHi: number;
  /** Distinguishes transforms of one role (e.g. 0 = linear, 1 = log10), and truncation at zero. */
  readonly kind: number;
}

/** Arrays kept per role and object: readings use at most a few variants of one measurement (as measured, a deflated or core width). */
export const DERIVED_PER_ROLE = 4;

interface DerivedEntry {
  value: number;
  errLo: number;
  errHi: number;
  kind: number;
  /** Generation at which the entry was filled. */
  at: number;
  out: Float64Array;
}

interface Slot {
  normals: Float64Array | null;
  uniforms: Float64Array | null;
  /** Generation at which each array was last filled (the bank's generation when current). */
  normalsAt: number;
  uniformsAt: number;
  /** Derived arrays of this role (see DrawBank.derived), reused round robin. */
  derived: DerivedEntry[];
  nextDerived: number;
}

/** A DrawBank whose arrays are reused from object to object (reset per object): no allocation in the hot path. */
export class ReusableDrawBank implements DrawBank {
  private slots = new Map<string, Slot>();
  private gen = 0;
  private base = 0;
  private draws = 0;

  get n(): number {
    return this.draws;
  }

  get generation(): number {
    return this.gen;
  }

  /**
   * Starts a new object: its deviates come from `rng` (two 32-bit words are taken as the base
   * seed of every role) and number `n` per role.
   */
  reset(rng: Rng, n: number): this {
    const lo = rng.nextUint32();
    const hi = rng.nextUint32() & 0x1fffff;
    this.base = hi * 4294967296 + lo;
    this.gen++;
    if (n !== this.draws) {
      this.slots.clear();
      this.draws = n;
    }
    return this;
  }

  private slot(role: string): Slot {
    let s = this.slots.get(role);
    if (!s) {
      s = { normals: null, uniforms: null, normalsAt: -1, uniformsAt: -1, derived: [], nextDerived: 0 };
      this.slots.set(role, s);
    }
    return s;
  }

  normals(role: string): Float64Array {
    const s = this.slot(role);
    if (s.normalsAt !== this.gen) {
      const rng = createRng(seedFor(this.base, role));
      const z = (s.normals ??= new Float64Array(this.draws));
      fillStandardNormals(rng, z);
      s.normalsAt = this.gen;
    }
    return s.normals as Float64Array;
  }

  uniforms(role: string): Float64Array {
    const s = this.slot(role);
    if (s.uniformsAt !== this.gen) {
      const rng = createRng(seedFor(this.base, `${role}:side`));
      const u = (s.uniforms ??= new Float64Array(this.draws));
      for (let k = 0; k < u.length; k++) u[k] = rng.next();
      s.uniformsAt = this.gen;
    }
    return s.uniforms as Float64Array;
  }

  redraws(role: string): Rng {
    return createRng(seedFor(this.base, `${role}:redraw`));
  }

  derived(role: string, key: DerivedKey, fill: (out: Float64Array) => void): Float64Array {
    const s = this.slot(role);
    const g = this.gen;
    let stale = -1;
    for (let i = 0; i < s.derived.length; i++) {
      const e = s.derived[i] as DerivedEntry;
      if (e.at !== g) {
        if (stale < 0) stale = i;
      } else if (e.value === key.value && e.errLo === key.errLo && e.errHi === key.errHi && e.kind === key.kind) return e.out;
    }
    let e: DerivedEntry;
    if (stale >= 0) {
      // An earlier object's entry, refilled in index order: the next to give way is the one after
      // it, so that once all are this object's, the oldest goes first.
      e = s.derived[stale] as DerivedEntry;
      s.nextDerived = (stale + 1) % DERIVED_PER_ROLE;
    } else if (s.derived.length < DERIVED_PER_ROLE) {
      e = { value: 0, errLo: 0, errHi: 0, kind: 0, at: -1, out: new Float64Array(this.draws) };
      s.derived.push(e);
    } else {
      e = s.derived[s.nextDerived] as DerivedEntry;
      s.nextDerived = (s.nextDerived + 1) % DERIVED_PER_ROLE;
    }
    // Marked stale while filling, so a fill that throws leaves no half-made entry behind.
    e.at = -1;
    fill(e.out);
    e.value = key.value;
    e.errLo = key.errLo;
    e.errHi = key.errHi;
    e.kind = key.kind;
    e.at = g;
    return e.out;
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
