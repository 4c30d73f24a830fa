/**
 * Edits of a draft as pure functions: each takes a draft and returns a new one, so the
 * history can keep every earlier draft as it was. Limits come from TOPIC_LIMITS; an edit
 * that would break one (a fifth option, removing the last outcome) returns the draft
 * unchanged.
 */
import { wordingMessages } from '../../core/messages/en/wording.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type { PatientLanguage } from '../../core/topic/topic-language.ts';
import { DEFAULT_HANDOUT_CHOICES, EMPTY_DISCLOSURES, TOPIC_LIMITS } from '../../core/topic/topic.ts';
import type { TopicDisclosures, TopicHandoutChoices } from '../../core/topic/topic.ts';
import { EMPTY_SCREENING, blankEffect } from './topic-draft.ts';
import type { EffectDraft, OptionDraft, OutcomeDraft, ScreeningDraft, TopicDraft } from './topic-draft.ts';

/** Fields of the topic itself that hold text. */
export type TopicTextField =
  | 'title'
  | 'population'
  | 'periodYears'
  | 'evidenceSummary'
  | 'evidenceReviewed'
  | 'clinician'
  | 'patientName'
  | 'patientReference';

/** Fields of an outcome that hold text. */
export type OutcomeTextField = 'name' | 'baselineRisk' | 'baselinePeriodYears' | 'baselineSource';

/** Fields of an effect that can be set. */
export type EffectField = Exclude<keyof EffectDraft, 'optionId' | 'level'>;

function freshId(prefix: string, taken: readonly string[]): string {
  let number = 1;
  while (taken.includes(`${prefix}-${number}`)) number += 1;
  return `${prefix}-${number}`;
}

/**
 * An outcome's baseline period follows the topic's while no baseline risk is typed: a risk
 * not yet given has no period of its own. Once a risk is typed, its period is what it was
 * typed over, and changing the topic's period never reinterprets it ("25% over 10 years").
 */
export function followsTopicPeriod(outcome: OutcomeDraft): boolean {
  return outcome.baselineRisk.trim() === '';
}

function withFollowingBaselines(draft: TopicDraft): TopicDraft {
  return {
    ...draft,
    outcomes: draft.outcomes.map((outcome) =>
      followsTopicPeriod(outcome)
        ? { ...outcome, baselinePeriodYears: draft.periodYears, baselinePeriodUnit: draft.periodUnit }
        : outcome,
    ),
  };
}

/** Set one text field of the topic; a new period is taken up by the baselines with no risk typed. */
export function setTopicText(draft: TopicDraft, field: TopicTextField, value: string): TopicDraft {
  const next = { ...draft, [field]: value };
  return field === 'periodYears' ? withFollowingBaselines(next) : next;
}

/**
 * Say which unit the topic's period is typed in; the amount typed stays as it is, and the
 * baselines with no risk typed follow. Effects' follow-ups never follow: they are facts of a trial.
 */
export function setPeriodUnit(draft: TopicDraft, unit: TimeUnit): TopicDraft {
  return withFollowingBaselines({ ...draft, periodUnit: unit });
}

/** Say which language the patient reads the topic in (a BCP 47 tag: "en", "es", "es-MX"). */
export function setLanguage(draft: TopicDraft, language: string): TopicDraft {
  return draft.language === language ? draft : { ...draft, language };
}

/** Mark the topic as an invented example, or not. */
export function setIllustrative(draft: TopicDraft, illustrative: boolean): TopicDraft {
  return { ...draft, illustrative };
}

function mapOption(draft: TopicDraft, optionId: string, change: (option: OptionDraft) => OptionDraft): TopicDraft {
  return { ...draft, options: draft.options.map((option) => (option.id === optionId ? change(option) : option)) };
}

/** Rename an option. */
export function setOptionName(draft: TopicDraft, optionId: string, name: string): TopicDraft {
  return mapOption(draft, optionId, (option) => ({ ...option, name }));
}

/** Make one option the comparison; its effects are kept, in case it stops being the comparison. */
export function setComparison(draft: TopicDraft, optionId: string): TopicDraft {
  if (!draft.options.some((option) => option.id === optionId)) return draft;
  return {
    ...draft,
    options: draft.options.map((option) => ({ ...option, isComparison: option.id === optionId })),
    outcomes: draft.outcomes.map((outcome) => withEffectsFor(outcome, draft.options)),
  };
}

function withEffectsFor(outcome: OutcomeDraft, options: readonly OptionDraft[]): OutcomeDraft {
  const missing = options.filter((option) => !outcome.effects.some((entry) => entry.optionId === option.id));
  if (missing.length === 0) return outcome;
  return { ...outcome, effects: [...outcome.effects, ...missing.map((option) => blankEffect(option.id))] };
}

/** Add an option (at most TOPIC_LIMITS.maxOptions), with a blank effect on every outcome. */
export function addOption(draft: TopicDraft, name = ''): { draft: TopicDraft; optionId: string | null } {
  if (draft.options.length >= TOPIC_LIMITS.maxOptions) return { draft, optionId: null };
  const id = freshId(
    'option',
    draft.options.map((option) => option.id),
  );
  const options = [...draft.options, { id, name, isComparison: false }];
  return {
    draft: { ...draft, options, outcomes: draft.outcomes.map((outcome) => withEffectsFor(outcome, options)) },
    optionId: id,
  };
}

/** Remove an option (keeping at least TOPIC_LIMITS.minOptions); removing the comparison passes it to the first other option. */
export function removeOption(draft: TopicDraft, optionId: string): TopicDraft {
  const removed = draft.options.find((option) => option.id === optionId);
  if (removed === undefined || draft.options.length <= TOPIC_LIMITS.minOptions) return draft;
  let options = draft.options.filter((option) => option.id !== optionId);
  if (removed.isComparison) options = options.map((option, index) => ({ ...option, isComparison: index === 0 }));
  return {
    ...draft,
    options,
    outcomes: draft.outcomes.map((outcome) => ({
      ...outcome,
      effects: outcome.effects.filter((entry) => entry.optionId !== optionId),
    })),
  };
}

/** Move an option one place up (−1) or down (+1). */
export function moveOption(draft: TopicDraft, optionId: string, step: -1 | 1): TopicDraft {
  const index = draft.options.findIndex((option) => option.id === optionId);
  const target = index + step;
  if (index === -1 || target < 0 || target >= draft.options.length) return draft;
  const options = [...draft.options];
  const [moved] = options.splice(index, 1);
  if (moved !== undefined) options.splice(target, 0, moved);
  return { ...draft, options };
}

function mapOutcome(draft: TopicDraft, outcomeId: string, change: (outcome: OutcomeDraft) => OutcomeDraft): TopicDraft {
  return { ...draft, outcomes: draft.outcomes.map((outcome) => (outcome.id === outcomeId ? change(outcome) : outcome)) };
}

/** Set one text field of an outcome. */
export function setOutcomeText(draft: TopicDraft, outcomeId: string, field: OutcomeTextField, value: string): TopicDraft {
  return mapOutcome(draft, outcomeId, (outcome) => ({ ...outcome, [field]: value }));
}

/** Say whether an outcome is a benefit the options aim at or a harm they may cause. */
export function setOutcomeKind(draft: TopicDraft, outcomeId: string, kind: 'benefit' | 'harm'): TopicDraft {
  return mapOutcome(draft, outcomeId, (outcome) => ({ ...outcome, kind }));
}

/** Say whether an outcome's event is one people want (true) or want to avoid (false). */
export function setOutcomeWanted(draft: TopicDraft, outcomeId: string, wanted: boolean): TopicDraft {
  return mapOutcome(draft, outcomeId, (outcome) => ({ ...outcome, wanted }));
}

/** Say which unit an outcome's baseline period is typed in. */
export function setBaselineUnit(draft: TopicDraft, outcomeId: string, unit: TimeUnit): TopicDraft {
  return mapOutcome(draft, outcomeId, (outcome) => ({ ...outcome, baselinePeriodUnit: unit }));
}

/** Make one outcome the headline. */
export function setHeadline(draft: TopicDraft, outcomeId: string): TopicDraft {
  if (!draft.outcomes.some((outcome) => outcome.id === outcomeId)) return draft;
  return { ...draft, outcomes: draft.outcomes.map((outcome) => ({ ...outcome, isHeadline: outcome.id === outcomeId })) };
}

/**
 * Add an outcome (at most TOPIC_LIMITS.maxOutcomes) over the topic's period, as an event to
 * avoid, with a blank effect per option.
 */
export function addOutcome(draft: TopicDraft, kind: 'benefit' | 'harm'): { draft: TopicDraft; outcomeId: string | null } {
  if (draft.outcomes.length >= TOPIC_LIMITS.maxOutcomes) return { draft, outcomeId: null };
  const id = freshId(
    'outcome',
    draft.outcomes.map((outcome) => outcome.id),
  );
  const outcome: OutcomeDraft = {
    id,
    name: '',
    kind,
    wanted: false,
    isHeadline: draft.outcomes.length === 0,
    baselineRisk: '',
    baselinePeriodYears: draft.periodYears,
    baselinePeriodUnit: draft.periodUnit,
    baselineSource: '',
    effects: draft.options.map((option) => blankEffect(option.id)),
  };
  return { draft: { ...draft, outcomes: [...draft.outcomes, outcome] }, outcomeId: id };
}

/** Remove an outcome (keeping at least one); the headline passes to the first one left. */
export function removeOutcome(draft: TopicDraft, outcomeId: string): TopicDraft {
  const removed = draft.outcomes.find((outcome) => outcome.id === outcomeId);
  if (removed === undefined || draft.outcomes.length <= TOPIC_LIMITS.minOutcomes) return draft;
  let outcomes = draft.outcomes.filter((outcome) => outcome.id !== outcomeId);
  if (removed.isHeadline) outcomes = outcomes.map((outcome, index) => ({ ...outcome, isHeadline: index === 0 }));
  return { ...draft, outcomes };
}

/** Set one field of one option's effect on one outcome. */
export function setEffectField<Field extends EffectField>(
  draft: TopicDraft,
  outcomeId: string,
  optionId: string,
  field: Field,
  value: EffectDraft[Field],
): TopicDraft {
  return mapOutcome(draft, outcomeId, (outcome) => {
    const present = withEffectsFor(outcome, draft.options);
    return {
      ...present,
      effects: present.effects.map((entry) => (entry.optionId === optionId ? { ...entry, [field]: value } : entry)),
    };
  });
}

/** Add a blank question for the handout (at most TOPIC_LIMITS.maxQuestions). */
export function addQuestion(draft: TopicDraft): TopicDraft {
  if (draft.questions.length >= TOPIC_LIMITS.maxQuestions) return draft;
  return { ...draft, questions: [...draft.questions, ''] };
}

/** Change one question. */
export function setQuestion(draft: TopicDraft, place: number, text: string): TopicDraft {
  return { ...draft, questions: draft.questions.map((question, index) => (index === place ? text : question)) };
}

/**
 * Remove one question. A copy in another language keeps each question's text as copied by its
 * place, so the questions after it take their sources along as they move up one place.
 */
export function removeQuestion(draft: TopicDraft, place: number): TopicDraft {
  const questions = draft.questions.filter((_, index) => index !== place);
  const { translation } = draft;
  if (translation === null) return { ...draft, questions };
  const sourceTexts: Record<string, string> = {};
  for (const [key, text] of Object.entries(translation.sourceTexts)) {
    const question = /^questions\.(\d+)$/.exec(key);
    const at = question === null ? null : Number(question[1]);
    if (at === null) sourceTexts[key] = text;
    else if (at < place) sourceTexts[key] = text;
    else if (at > place) sourceTexts[`questions.${at - 1}`] = text;
  }
  return { ...draft, questions, translation: { ...translation, sourceTexts } };
}

/**
 * Take a text of a copy in another language as written in it, though it reads as it was copied
 * (a medicine's or a test's name that is the same in both): it leaves the texts still to translate.
 */
export function keepAsTranslated(draft: TopicDraft, key: string): TopicDraft {
  const { translation } = draft;
  if (translation === null || !(key in translation.sourceTexts)) return draft;
  const sourceTexts = Object.fromEntries(Object.entries(translation.sourceTexts).filter(([found]) => found !== key));
  return { ...draft, translation: { ...translation, sourceTexts } };
}

/** How a new topic starts: the patient language it is written in, and its comparison's name in that language. */
export interface BlankTopic {
  readonly language: PatientLanguage;
  readonly comparisonName: string;
}

/**
 * A new, empty topic: a comparison, one option and one benefit, over 10 years, in English unless
 * another language is given.
 *
 * @example blankDraft({ language: 'es', comparisonName: 'sin tratamiento' }).options[0]?.name // => 'sin tratamiento'
 */
export function blankDraft(start: BlankTopic = { language: 'en', comparisonName: wordingMessages.newComparison }): TopicDraft {
  const options: OptionDraft[] = [
    { id: 'comparison', name: start.comparisonName, isComparison: true },
    { id: 'option-1', name: '', isComparison: false },
  ];
  return {
    title: '',
    population: '',
    periodYears: '10',
    periodUnit: 'years',
    illustrative: false,
    options,
    outcomes: [
      {
        id: 'outcome-1',
        name: '',
        kind: 'benefit',
        wanted: false,
        isHeadline: true,
        baselineRisk: '',
        baselinePeriodYears: '10',
        baselinePeriodUnit: 'years',
        baselineSource: '',
        effects: options.map((option) => blankEffect(option.id)),
      },
    ],
    evidenceSummary: '',
    evidenceReviewed: '',
    questions: [],
    clinician: '',
    patientName: '',
    patientReference: '',
    handout: DEFAULT_HANDOUT_CHOICES,
    about: EMPTY_DISCLOSURES,
    screening: EMPTY_SCREENING,
    language: start.language,
    translation: null,
  };
}

/** Set one of the disclosures: who prepared the topic, funding, interests, the review-by date. */
export function setDisclosure(draft: TopicDraft, field: keyof TopicDisclosures, value: string): TopicDraft {
  return { ...draft, about: { ...draft.about, [field]: value } };
}

/** Set one entry of the screening section. */
export function setScreening(draft: TopicDraft, field: keyof ScreeningDraft, value: string): TopicDraft {
  return { ...draft, screening: { ...draft.screening, [field]: value } };
}

/** Change one of the handout's choices (kept with the topic). */
export function setHandoutChoice<Choice extends keyof TopicHandoutChoices>(
  draft: TopicDraft,
  choice: Choice,
  value: TopicHandoutChoices[Choice],
): TopicDraft {
  if (draft.handout[choice] === value) return draft;
  return { ...draft, handout: { ...draft.handout, [choice]: value } };
}
