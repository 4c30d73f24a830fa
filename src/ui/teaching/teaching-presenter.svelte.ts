/**
 * What the teaching view does, apart from drawing: the presentation it steps through,
 * the keys it answers, its file menu (save a slide, open or save a teaching set) and
 * the message it shows. A message belongs to the slide it was given on and goes at
 * the next step. The view only draws this state and hands it key presses.
 */
import type { Topic } from '../../core/topic/topic.ts';
import type { Denominator } from '../../core/types.ts';
import { teachingClinicianMessagesEn } from '../../teaching/messages/en.ts';
import type { PatientSlideWords } from '../../teaching/messages/patient-slide-words.ts';
import type { TeachingClinicianMessages } from '../../teaching/messages/teaching-messages.ts';
import { presentationItem } from '../../teaching/presentation-item.ts';
import { resolveTeachingSet } from '../../teaching/resolve-teaching-set.ts';
import { readTeachingSet } from '../../teaching/teaching-set-file.ts';
import { DEFAULT_STEPS } from '../../teaching/teaching-steps.ts';
import type { Platform } from '../platform/platform.ts';
import { slideFileName, slidePngFile, slideSvgFile } from './slide-export.ts';
import type { ExampleSet } from './teaching-examples.ts';
import { teachingKeyAction } from './teaching-keys.ts';
import type { KeyPress, TeachingAction } from './teaching-keys.ts';
import { TeachingSession } from './teaching-session.svelte.ts';

export interface TeachingMessage {
  readonly tone: 'error' | 'info';
  readonly text: string;
}

export interface TeachingPresenterOptions {
  /** The topic to present: a copy of the editor's, never written back. */
  readonly topic: Topic;
  readonly per: Denominator | null;
  readonly platform: Pick<Platform, 'saveFile' | 'pickTextFile'>;
  /** The document slides are drawn in for saving. */
  readonly document: Document;
  /** The example sets the menu offers; the first is opened. */
  readonly examples: readonly ExampleSet[];
  /** Called once, when the presenter leaves. */
  readonly onleave: () => void;
  /** Gives focus back to the view after a file dialog. */
  readonly refocus?: () => void;
  /** The controls' and the lesson's words, in the clinician's interface language (English by default). */
  readonly messages?: TeachingClinicianMessages;
  /** Picks the words a patient reads on a topic's slides by the topic's language (the shipped ones by default). */
  readonly patientWords?: PatientSlideWords;
}

export class TeachingPresenter {
  readonly session: TeachingSession;
  /** The clinician's words: the controls, the messages and the lesson. */
  readonly words: TeachingClinicianMessages;
  /** Why the topic cannot be presented, or null when it can. */
  readonly problem: string | null;
  message = $state.raw<TeachingMessage | null>(null);
  menuOpen = $state(false);
  /** A slide is being saved; the menu waits. */
  busy = $state(false);

  readonly #options: TeachingPresenterOptions;
  #leaving = false;

  constructor(options: TeachingPresenterOptions) {
    this.#options = options;
    this.words = options.messages ?? teachingClinicianMessagesEn;
    const first = presentationItem(options.topic, { option: null, harm: null, per: options.per, steps: DEFAULT_STEPS });
    this.session = new TeachingSession(options.topic.title, first.ok ? [first.item] : [], {
      clinician: this.words,
      ...(options.patientWords === undefined ? {} : { patient: options.patientWords }),
    });
    this.problem = first.ok
      ? null
      : this.words.view.cannotPresent(first.problem.kind === 'not-computed' ? first.problem.detail : first.problem.kind);
  }

  /** How many topics the presentation has. */
  get topics(): number {
    return this.session.items.length;
  }

  /** Where the presenter is, in words, for the live region and the saved slide's footer. */
  get progressLabel(): string {
    const { session } = this;
    return session.place === null
      ? ''
      : this.words.view.progressLabel(session.index + 1, session.total, session.place.item + 1, this.topics);
  }

  get announcement(): string {
    const label = this.progressLabel;
    return this.session.slide === null || label === '' ? '' : `${label}: ${this.session.slide.heading}`;
  }

  /** Step through the presentation; a message given on the slide left goes with it. */
  step(action: Exclude<TeachingAction, 'leave'>): void {
    if (this.session.act(action)) this.message = null;
  }

  leave(): void {
    if (this.#leaving) return;
    this.#leaving = true;
    this.#options.onleave();
  }

  /** Answer a key press; returns whether the view took it (and so the page must not). */
  key(press: KeyPress): boolean {
    if (this.menuOpen && press.key === 'Escape') {
      this.menuOpen = false;
      return true;
    }
    const action = teachingKeyAction(press);
    if (action === null) return false;
    if (action === 'leave') this.leave();
    else this.step(action);
    return true;
  }

  /** Escape on the view itself (the dialog's cancel): close the menu first, then leave. */
  cancel(): void {
    if (this.menuOpen) this.menuOpen = false;
    else this.leave();
  }

  toggleMenu(): void {
    this.menuOpen = !this.menuOpen;
    if (this.menuOpen) this.message = null;
  }

  dismiss(): void {
    this.message = null;
  }

  async exportSlide(format: 'svg' | 'png'): Promise<void> {
    const { session, words } = this;
    const slide = session.slide;
    const place = session.place;
    if (slide === null || place === null) return;
    this.menuOpen = false;
    this.busy = true;
    const name = slideFileName(session.title, session.index + 1, place.kind, format);
    const document = this.#options.document;
    try {
      const footer = this.progressLabel;
      const saved =
        format === 'svg'
          ? await this.#options.platform.saveFile(
              name,
              slideSvgFile(slide, document, footer, words.view.illustrativeLong),
              'image/svg+xml',
            )
          : await this.#options.platform.saveFile(
              name,
              await slidePngFile(slide, document, footer, words.view.illustrativeLong),
              'image/png',
            );
      if (saved !== null) this.message = { tone: 'info', text: words.view.exported(saved) };
    } catch (error) {
      this.message = { tone: 'error', text: words.view.exportFailed(error instanceof Error ? error.message : String(error)) };
    } finally {
      this.busy = false;
      this.#options.refocus?.();
    }
  }

  /** Present a teaching set from its file text; a bad set leaves the presentation as it was. */
  async openSetText(name: string, text: string): Promise<void> {
    const reading = readTeachingSet(name, text);
    if (!reading.ok) {
      this.message = { tone: 'error', text: this.words.view.notOpened(reading.message) };
      return;
    }
    const resolved = await resolveTeachingSet(name, reading.set, null);
    if (!resolved.ok) {
      this.message = { tone: 'error', text: this.words.view.notOpened(resolved.message) };
      return;
    }
    this.session.load(resolved.title, resolved.items, name);
    this.message = { tone: 'info', text: this.words.view.opened(resolved.title, resolved.items.length) };
  }

  async openSet(): Promise<void> {
    this.menuOpen = false;
    // Not the editor's open-topic path: a teaching set never becomes the editor's document.
    const picked = await this.#options.platform.pickTextFile('.json,application/json');
    if (picked !== null) await this.openSetText(picked.name, picked.text);
    this.#options.refocus?.();
  }

  async openExample(): Promise<void> {
    this.menuOpen = false;
    const example = this.#options.examples[0];
    if (example !== undefined) await this.openSetText(example.fileName, example.text);
    this.#options.refocus?.();
  }

  async saveSet(): Promise<void> {
    this.menuOpen = false;
    const { session } = this;
    const base = slideFileName(session.title, session.index + 1, session.place?.kind ?? 'title', '').replace(/-\d+-[a-z-]+$/, '');
    const name = session.fileName ?? `${base}${this.words.file.setSuffix}`;
    const saved = await this.#options.platform.saveFile(name, session.setFileText(), 'application/json');
    if (saved !== null) this.message = { tone: 'info', text: this.words.view.saved(saved) };
    this.#options.refocus?.();
  }
}
