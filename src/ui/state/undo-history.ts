/**
 * An undo history of immutable states. Changes to the same field in quick succession
 * (typing a word) merge into one step, so undo takes back a whole entry rather than a
 * character; any other change starts a new step.
 */

export interface HistorySettings {
  /** How many steps back are kept. */
  readonly limit?: number;
  /** Changes with the same merge key closer together than this (milliseconds) are one step. */
  readonly mergeWindow?: number;
}

export class UndoHistory<State> {
  #past: State[] = [];
  #future: State[] = [];
  #present: State;
  #lastKey: string | null = null;
  #lastTime = Number.NEGATIVE_INFINITY;
  readonly #limit: number;
  readonly #mergeWindow: number;

  constructor(initial: State, settings: HistorySettings = {}) {
    this.#present = initial;
    this.#limit = settings.limit ?? 200;
    this.#mergeWindow = settings.mergeWindow ?? 1200;
  }

  /** The current state. */
  get present(): State {
    return this.#present;
  }

  get canUndo(): boolean {
    return this.#past.length > 0;
  }

  get canRedo(): boolean {
    return this.#future.length > 0;
  }

  /** Record a new state. `mergeKey` names the field changed; null never merges. */
  record(next: State, mergeKey: string | null, time: number): void {
    if (next === this.#present) return;
    const merges = mergeKey !== null && mergeKey === this.#lastKey && time - this.#lastTime < this.#mergeWindow;
    if (!merges) {
      this.#past.push(this.#present);
      if (this.#past.length > this.#limit) this.#past.shift();
    }
    this.#present = next;
    this.#future = [];
    this.#lastKey = mergeKey;
    this.#lastTime = time;
  }

  /** Step back; returns the state now current, or null when there is nothing to undo. */
  undo(): State | null {
    const previous = this.#past.pop();
    if (previous === undefined) return null;
    this.#future.push(this.#present);
    this.#present = previous;
    this.#lastKey = null;
    return previous;
  }

  /** Step forward again; returns the state now current, or null when there is nothing to redo. */
  redo(): State | null {
    const next = this.#future.pop();
    if (next === undefined) return null;
    this.#past.push(this.#present);
    this.#present = next;
    this.#lastKey = null;
    return next;
  }
}
