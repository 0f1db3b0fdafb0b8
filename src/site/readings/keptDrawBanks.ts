/**
 * Each object's bank of deviates (src/core/random/drawBank.ts), kept in a web worker of the live
 * reading from one derivation to the next. An object's deviates depend only on the seed, its id
 * and the number of draws, never on the reading, so every reading the reader tries draws the
 * same ones: kept, they are drawn once per page instead of once per submit (about half of the
 * time of a derivation, measured on the demo catalog). The numbers are the same bits as with a
 * fresh stream: a kept bank is the bank deriveObject would make from the object's stream.
 * Bounded: banks are kept until they hold `budgetBytes` of deviates; later objects draw theirs
 * afresh on every derivation.
 */
import { drawCount } from '../../core/derive/drawCount.ts';
import type { DeriveSettings } from '../../core/derive/types.ts';
import { DERIVED_PER_ROLE, ReusableDrawBank, type DerivedKey, type DrawBank } from '../../core/random/drawBank.ts';
import { createRng, seedFor } from '../../core/random/index.ts';
import type { Rng } from '../../core/random/rng.ts';

/** Deviates kept per worker by default: 10,000 objects × 200 draws take about 80 MB, split between the workers. */
export const KEPT_DEVIATES_BYTES = 64 * 1024 * 1024;

/** A bank that never resets, counting the bytes of each role it fills. */
class KeptBank implements DrawBank {
  private readonly filled = new Set<string>();
  private readonly derivedKeys = new Map<string, number>();
  constructor(
    private readonly bank: ReusableDrawBank,
    private readonly onFill: (bytes: number) => void,
  ) {}

  get n(): number {
    return this.bank.n;
  }

  private count(key: string): void {
    if (this.filled.has(key)) return;
    this.filled.add(key);
    this.onFill(this.bank.n * Float64Array.BYTES_PER_ELEMENT);
  }

  normals(role: string): Float64Array {
    this.count(`n:${role}`);
    return this.bank.normals(role);
  }

  uniforms(role: string): Float64Array {
    this.count(`u:${role}`);
    return this.bank.uniforms(role);
  }

  redraws(role: string): Rng {
    return this.bank.redraws(role);
  }

  get generation(): number {
    return this.bank.generation;
  }

  derived(role: string, key: DerivedKey, fill: (out: Float64Array) => void): Float64Array {
    // The bank keeps at most DERIVED_PER_ROLE such arrays per role (the log10 of a width as
    // measured, deflated, …), reusing them for new keys: count each of those once.
    const seen = this.derivedKeys.get(role) ?? 0;
    if (seen < DERIVED_PER_ROLE) {
      const k = `${key.kind}:${key.value}:${key.errLo}:${key.errHi}`;
      if (!this.filled.has(`d:${role}:${k}`)) {
        this.derivedKeys.set(role, seen + 1);
        this.count(`d:${role}:${k}`);
      }
    }
    return this.bank.derived(role, key, fill);
  }
}

/** The kept banks of one worker's objects. */
export class KeptDrawBanks {
  private banks = new Map<string, KeptBank>();
  private seed = NaN;
  private draws = 0;
  private bytes = 0;

  constructor(private readonly budgetBytes = KEPT_DEVIATES_BYTES) {}

  /** Bytes of deviates held. */
  get heldBytes(): number {
    return this.bytes;
  }

  /** Objects whose bank is kept. */
  get kept(): number {
    return this.banks.size;
  }

  /**
   * The object's deviates under `settings`: its kept bank, or a new one kept while the budget
   * lasts, or else its fresh random stream (deriveObject then draws the deviates itself).
   * Changing the seed or the number of draws drops every kept bank.
   */
  randomFor(id: string, settings: DeriveSettings): DrawBank | Rng {
    const draws = drawCount(settings);
    if (settings.seed !== this.seed || draws !== this.draws) {
      this.banks.clear();
      this.bytes = 0;
      this.seed = settings.seed;
      this.draws = draws;
    }
    const kept = this.banks.get(id);
    if (kept) return kept;
    const rng = createRng(seedFor(settings.seed, id));
    if (this.bytes >= this.budgetBytes) return rng;
    const bank = new KeptBank(new ReusableDrawBank().reset(rng, draws), (b) => (this.bytes += b));
    this.banks.set(id, bank);
    return bank;
  }
}
