/**
 * The editor's state: the draft as typed, its check and results, the undo history, the
 * autosave and whether there are unsaved changes. Every change goes through `change`,
 * `load`, `undo` or `redo`, so the history, the check and the autosave never miss one.
 */
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { WordsDenominator } from '../../core/types.ts';
import { checkDraft, isMissing } from '../draft/check-draft.ts';
import { setHandoutChoice } from '../draft/draft-edits.ts';
import type { DraftCheck, FieldProblem } from '../draft/check-draft.ts';
import { handoutGaps } from '../draft/handout-gaps.ts';
import type { HandoutGap } from '../draft/handout-gaps.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';
import { untranslatedTexts } from '../draft/translation-texts.ts';
import type { TranslatableText } from '../draft/translation-texts.ts';
import { withoutPatient } from './autosave.ts';
import type { Autosave, AutosaveRecord } from './autosave.ts';
import { UndoHistory } from './undo-history.ts';

/** Runs a task later; returns a function that cancels it. */
export type Scheduler = (task: () => void, delay: number) => () => void;

export interface EditorSettings {
  readonly fileName?: string | null;
  readonly autosave?: Autosave | null;
  /** Milliseconds since some fixed time, for merging quick edits of one field into one undo step. */
  readonly now?: () => number;
  /** The current date, for the autosave's time stamp. */
  readonly today?: () => Date;
  readonly schedule?: Scheduler;
  /** Delay before an autosave, in milliseconds. */
  readonly autosaveDelay?: number;
  /** Told of every autosave (the desktop shell keeps a crash-recovery copy too). */
  readonly onAutosave?: (record: AutosaveRecord) => void;
}

const defaultSchedule: Scheduler = (task, delay) => {
  const timer = setTimeout(task, delay);
  return () => clearTimeout(timer);
};

const signature = (draft: TopicDraft): string => JSON.stringify(draft);

function groupByKey(problems: readonly FieldProblem[]): Map<string, FieldProblem[]> {
  const byKey = new Map<string, FieldProblem[]>();
  for (const found of problems) {
    if (found.key !== null) byKey.set(found.key, [...(byKey.get(found.key) ?? []), found]);
  }
  return byKey;
}

export class TopicEditor {
  /** The draft exactly as typed. */
  draft = $state.raw<TopicDraft>() as TopicDraft;
  /** The check of the current draft: every problem, and the result when there are none. */
  check = $state.raw<DraftCheck>() as DraftCheck;
  /** The results on screen: the current draft's, or the last valid draft's while it has problems. */
  shown = $state.raw<TopicResult | null>(null);
  /** True when `shown` comes from an earlier draft than the one being edited. */
  stale = $state(false);
  canUndo = $state(false);
  canRedo = $state(false);
  hasUnsavedChanges = $state(false);
  fileName = $state.raw<string | null>(null);

  #history: UndoHistory<TopicDraft>;
  /** Fields the person has changed since the topic was loaded. */
  #touched = $state.raw<ReadonlySet<string>>(new Set());
  /** Every problem of the current draft; missing entries in untouched fields are marked as still needed. */
  problems = $derived(
    this.check.problems.map((found) => ({
      ...found,
      needed: found.key !== null && isMissing(found.problem) && !this.#touched.has(found.key),
    })),
  );
  #problemsByKey = $derived(groupByKey(this.problems));
  /** What the handout would print as "not stated": disclosures and effect sources not yet given. */
  handoutGaps: readonly HandoutGap[] = $derived(handoutGaps(this.draft));
  /** The typed texts of a copy in another language that still read as they were copied. */
  untranslated: readonly TranslatableText[] = $derived(untranslatedTexts(this.draft));
  #lastValidDraft: TopicDraft | null = null;
  #savedSignature: string;
  #cancelAutosave: (() => void) | null = null;
  readonly #autosave: Autosave | null;
  readonly #now: () => number;
  readonly #today: () => Date;
  readonly #schedule: Scheduler;
  readonly #autosaveDelay: number;
  readonly #onAutosave: ((record: AutosaveRecord) => void) | null;

  constructor(initial: TopicDraft, settings: EditorSettings = {}) {
    this.#autosave = settings.autosave ?? null;
    this.#now = settings.now ?? (() => Date.now());
    this.#today = settings.today ?? (() => new Date());
    this.#schedule = settings.schedule ?? defaultSchedule;
    this.#autosaveDelay = settings.autosaveDelay ?? 500;
    this.#onAutosave = settings.onAutosave ?? null;
    this.#history = new UndoHistory(initial);
    this.#savedSignature = signature(initial);
    this.fileName = settings.fileName ?? null;
    this.#show(initial);
  }

  /** The chosen denominator, or null to let the core choose; one of the topic's handout choices. */
  get per(): WordsDenominator | null {
    return this.draft.handout.per;
  }

  /** The problems of one field, in the order found. */
  problemsFor(key: string): readonly FieldProblem[] {
    return this.#problemsByKey.get(key) ?? [];
  }

  /** Apply an edit. `mergeKey` names the field, so that typing in it makes one undo step. */
  change(edit: (draft: TopicDraft) => TopicDraft, mergeKey: string | null = null): void {
    const next = edit(this.draft);
    if (next === this.draft) return;
    if (mergeKey !== null && !this.#touched.has(mergeKey)) this.#touched = new Set([...this.#touched, mergeKey]);
    this.#history.record(next, mergeKey, this.#now());
    this.#show(next);
    this.#queueAutosave();
  }

  /**
   * Replace the draft with another document (a file, an example, a new topic, restored work).
   * Its history starts afresh: undo works within the document on screen and never brings
   * back another, so the file name and Save always belong to what is shown.
   */
  load(draft: TopicDraft, settings: { readonly fileName: string | null; readonly saved: boolean }): void {
    this.#history = new UndoHistory(draft);
    this.fileName = settings.fileName;
    // Unsaved restored work is unsaved against any file it came from.
    this.#savedSignature = settings.saved ? signature(draft) : '';
    // Results of the topic left behind must never show as if they were this one's.
    this.#lastValidDraft = null;
    this.#touched = new Set();
    this.#show(draft);
    this.#queueAutosave();
  }

  /** Note that the current draft was written to a file. */
  markSaved(fileName: string): void {
    this.fileName = fileName;
    this.#savedSignature = signature(this.draft);
    this.hasUnsavedChanges = false;
    this.flushAutosave();
  }

  undo(): boolean {
    const previous = this.#history.undo();
    if (previous === null) return false;
    this.#show(previous);
    this.#queueAutosave();
    return true;
  }

  redo(): boolean {
    const next = this.#history.redo();
    if (next === null) return false;
    this.#show(next);
    this.#queueAutosave();
    return true;
  }

  /** Show the numbers per 100, 1000 or more people, or (null) let the core choose; kept with the topic. */
  setPer(per: WordsDenominator | null): void {
    this.change((draft) => setHandoutChoice(draft, 'per', per));
  }

  /** Write the autosave now (before the page is hidden or closed). */
  flushAutosave(): void {
    this.#cancelAutosave?.();
    this.#cancelAutosave = null;
    const record: AutosaveRecord = {
      draft: withoutPatient(this.draft),
      fileName: this.fileName,
      savedAt: this.#today().toISOString(),
      unsaved: this.hasUnsavedChanges,
    };
    this.#autosave?.save(record);
    this.#onAutosave?.(record);
  }

  #queueAutosave(): void {
    if (this.#autosave === null && this.#onAutosave === null) return;
    this.#cancelAutosave?.();
    this.#cancelAutosave = this.#schedule(() => {
      this.#cancelAutosave = null;
      this.flushAutosave();
    }, this.#autosaveDelay);
  }

  #show(draft: TopicDraft): void {
    const { per } = draft.handout;
    const check = checkDraft(draft, { per });
    if (check.result !== null) this.#lastValidDraft = draft;
    const fallback =
      check.result === null && this.#lastValidDraft !== null ? checkDraft(this.#lastValidDraft, { per }).result : null;
    this.draft = draft;
    this.check = check;
    this.shown = check.result ?? fallback;
    this.stale = check.result === null;
    this.canUndo = this.#history.canUndo;
    this.canRedo = this.#history.canRedo;
    this.hasUnsavedChanges = signature(draft) !== this.#savedSignature;
  }
}
