/**
 * The teaching-set file, version 1: a titled list of topics to present in order,
 * each with the steps to show. A topic is either written inside the set (a whole
 * topic file, as saved by the editor) or, where files can be read (Node, the desktop
 * shell), a relative path from the set's folder to a topic file.
 *
 *   {
 *     "format": "chancewise-teaching-set",
 *     "version": 1,
 *     "title": "Framing effects",
 *     "items": [
 *       { "topic": { "format": "chancewise-topic", "version": 2, "topic": { … } },
 *         "option": "standard", "harm": "muscle", "per": 100,
 *         "steps": ["title", "baseline", "with-option", "helped"] },
 *       { "topic": "../demo/02-bowel-screening.json" }
 *     ]
 *   }
 *
 * `option` (the option shown against the comparison), `harm` (the one harm outcome of the
 * "who is harmed" step; left out, every harm is shown, a slide each), `per` (100 or 1000
 * people; null lets the core choose) and
 * `steps` (default: every step, in order) may be left out.
 */
import * as v from 'valibot';
import { DEFAULT_STEPS, STEP_KINDS } from './teaching-steps.ts';

/** The name every teaching set carries in its `format` field. */
export const TEACHING_SET_FORMAT = 'chancewise-teaching-set';
/** The version this build reads and writes. */
export const TEACHING_SET_VERSION = 1;

const itemSchema = v.object({
  topic: v.union([v.string(), v.looseObject({})]),
  option: v.optional(v.nullable(v.string()), null),
  harm: v.optional(v.nullable(v.string()), null),
  per: v.optional(v.nullable(v.picklist([100, 1000])), null),
  steps: v.optional(v.pipe(v.array(v.picklist(STEP_KINDS)), v.minLength(1)), [...DEFAULT_STEPS]),
});

/** Schema of a version 1 teaching set. Embedded topics are checked afterwards, by the topic file reader. */
export const teachingSetSchema = v.object({
  format: v.literal(TEACHING_SET_FORMAT),
  version: v.literal(TEACHING_SET_VERSION),
  title: v.string(),
  items: v.pipe(v.array(itemSchema), v.minLength(1)),
});

export type TeachingSetFile = v.InferOutput<typeof teachingSetSchema>;
