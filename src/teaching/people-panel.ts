/**
 * Building the people arrays of a slide: the layout from the core's groups, every
 * person's look, and the counts under the array, counted by look so that they always
 * match what is drawn.
 */
import { lookOf } from '../core/direction.ts';
import type { PeopleGroups } from '../core/types.ts';
import { iconArrayLayout } from '../render/icon-array-layout.ts';
import type { Arrangement } from '../render/icon-array-layout.ts';
import { type RankSpan, isUncertain } from '../render/uncertain-people.ts';
import type { TeachingPatientSlideMessages } from './messages/teaching-messages.ts';
import type { PanelChip, PeoplePanel, PersonLook } from './slide-model.ts';

/** The order of the counts under an array: the fill order, with the outlined people after the changed ones. */
export const LOOK_ORDER: readonly PersonLook[] = ['event', 'helped', 'harmed', 'uncertain', 'free'];

/** The same people with the change folded into the totals: only "has it" and "does not". */
export function totalsOnly(groups: PeopleGroups): PeopleGroups {
  return {
    denominator: groups.denominator,
    event: groups.event + groups.caused,
    prevented: 0,
    caused: 0,
    free: groups.free + groups.prevented,
  };
}

/**
 * The group an option's helped or harmed people are in: `prevented` (have the event only
 * without it) or `caused` (only with it), as `lookOf` draws them for the event's direction.
 *
 * @example changedGroup('helped', true) // => 'caused' (more people have a wanted event)
 */
export function changedGroup(look: 'helped' | 'harmed', wanted: boolean): 'prevented' | 'caused' {
  return lookOf('prevented', wanted) === look ? 'prevented' : 'caused';
}

export interface PanelSettings {
  readonly id: string;
  readonly title: string;
  readonly groups: PeopleGroups;
  /** The outcome and option the counts are worded with. */
  readonly outcome: string;
  readonly option: string;
  /** The outcome's event is one people want: its gained people are helped, its lost people harmed. */
  readonly wanted: boolean;
  readonly arrangement?: Arrangement;
  readonly seed?: number;
  /** Ranks of the people to outline as uncertain. */
  readonly uncertain?: RankSpan | null;
}

/** One people array of a slide. */
export function peoplePanel(settings: PanelSettings, messages: TeachingPatientSlideMessages): PeoplePanel {
  const layout = iconArrayLayout(settings.groups.denominator, settings.groups, {
    arrangement: settings.arrangement ?? 'grouped',
    ...(settings.seed === undefined ? {} : { seed: settings.seed }),
  });
  const span = settings.uncertain ?? null;
  const { wanted } = settings;
  const looks: PersonLook[] = layout.people.map((person) =>
    isUncertain(person.rank, span) ? 'uncertain' : lookOf(person.group, wanted),
  );
  const counts = new Map<PersonLook, number>();
  for (const look of looks) counts.set(look, (counts.get(look) ?? 0) + 1);
  const words = messages.chips;
  const label = (look: PersonLook, count: number): string => {
    switch (look) {
      case 'helped':
      case 'harmed':
        return words.changed(changedGroup(look, wanted), wanted, count, settings.outcome, settings.option);
      case 'uncertain':
        return words.uncertain(count, settings.outcome);
      case 'free':
        return words.free(count, settings.outcome);
      case 'event':
        return words.event(count, settings.outcome);
    }
  };
  const chips: PanelChip[] = LOOK_ORDER.flatMap((look) => {
    const count = counts.get(look) ?? 0;
    return count > 0 ? [{ look, count, label: label(look, count) }] : [];
  });
  return {
    id: settings.id,
    title: settings.title,
    layout,
    looks,
    chips,
    description: messages.panels.description(
      settings.title,
      chips.map((chip) => chip.label),
    ),
  };
}
