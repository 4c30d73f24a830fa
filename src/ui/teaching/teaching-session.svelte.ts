/**
 * The state of a teaching presentation: the topics in order, each with its steps,
 * and where the presenter is. Every slide of every topic is one place in a single
 * sequence, so stepping forward from a topic's last step goes to the next topic's
 * first. The topics are copies: presenting never changes the editor's topic.
 */
import { topicLanguage } from '../../core/topic/topic-language.ts';
import { buildSlide } from '../../teaching/build-slide.ts';
import { teachingClinicianMessagesEn, teachingMessagesWith } from '../../teaching/messages/en.ts';
import type { TeachingMessages } from '../../teaching/messages/en.ts';
import { type PatientSlideWords, patientSlideWordsFor } from '../../teaching/messages/patient-slide-words.ts';
import type { TeachingClinicianMessages } from '../../teaching/messages/teaching-messages.ts';
import type { PresentationItem } from '../../teaching/presentation-item.ts';
import { slidePlaces } from '../../teaching/slide-places.ts';
import type { SlidePlace } from '../../teaching/slide-places.ts';
import type { Slide } from '../../teaching/slide-model.ts';
import { writeTeachingSet } from '../../teaching/teaching-set-file.ts';
import type { TeachingAction } from './teaching-keys.ts';

export class TeachingSession {
  /** The presentation's title: the set's, or the topic's. */
  title = $state('');
  items = $state.raw<readonly PresentationItem[]>([]);
  /** The teaching set's file name, when the presentation came from one. */
  fileName = $state.raw<string | null>(null);
  /** The place in the sequence, from 0. */
  index = $state(0);
  readonly #patient: PatientSlideWords;
  readonly #clinician: TeachingClinicianMessages;

  readonly places = $derived(slidePlaces(this.items));
  readonly place = $derived<SlidePlace | null>(this.places[this.index] ?? null);
  readonly item = $derived<PresentationItem | null>(this.place === null ? null : (this.items[this.place.item] ?? null));
  readonly slide = $derived<Slide | null>(
    this.item === null || this.place === null
      ? null
      : buildSlide(this.item, this.place.kind, this.messagesOf(this.item), this.place.part),
  );

  /**
   * The patient's slide words follow each topic's own language (`patient` picks them; the
   * ones Chancewise ships unless given); the clinician's are English unless given.
   */
  constructor(
    title: string,
    items: readonly PresentationItem[],
    words: { readonly patient?: PatientSlideWords; readonly clinician?: TeachingClinicianMessages } = {},
  ) {
    this.#patient = words.patient ?? patientSlideWordsFor;
    this.#clinician = words.clinician ?? teachingClinicianMessagesEn;
    this.load(title, items, null);
  }

  /** A topic's slide words: the patient's in the topic's language, beside the clinician's. */
  messagesOf(item: PresentationItem): TeachingMessages {
    return teachingMessagesWith(this.#patient(topicLanguage(item.topic)), this.#clinician);
  }

  get total(): number {
    return this.places.length;
  }

  get atStart(): boolean {
    return this.index === 0;
  }

  get atEnd(): boolean {
    return this.index >= this.places.length - 1;
  }

  /** Replace the presentation (a teaching set was opened) and go to its first slide. */
  load(title: string, items: readonly PresentationItem[], fileName: string | null): void {
    this.title = title;
    this.items = items;
    this.fileName = fileName;
    this.index = 0;
  }

  /** Go to a place in the sequence, kept inside it; returns whether the place changed. */
  goTo(index: number): boolean {
    const next = Math.max(0, Math.min(index, this.places.length - 1));
    if (next === this.index) return false;
    this.index = next;
    return true;
  }

  next(): boolean {
    return this.goTo(this.index + 1);
  }

  previous(): boolean {
    return this.goTo(this.index - 1);
  }

  first(): boolean {
    return this.goTo(0);
  }

  last(): boolean {
    return this.goTo(this.places.length - 1);
  }

  /** Carry out a key's action; "leave" is the view's to handle and changes nothing here. */
  act(action: TeachingAction): boolean {
    switch (action) {
      case 'next':
        return this.next();
      case 'previous':
        return this.previous();
      case 'first':
        return this.first();
      case 'last':
        return this.last();
      case 'leave':
        return false;
    }
  }

  /** The presentation as a teaching set's file text, every topic written inside it. */
  setFileText(): string {
    return writeTeachingSet(
      this.title,
      this.items.map((item) => ({ topic: item.topic, option: item.option, harm: item.harm, per: item.per, steps: item.steps })),
    );
  }
}
