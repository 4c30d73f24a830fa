import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import { evaluateTopic } from '../../../src/core/topic/compute-topic.ts';
import { migrateTopicV1, readTopicFile, writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import { TOPIC_FORMAT, TOPIC_VERSION, topicFileV1Schema } from '../../../src/core/topic/topic-schema.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { validateTopic } from '../../../src/core/topic/validate-topic.ts';
import * as v from 'valibot';

// Topic files are Chancewise's own format (src/core/topic/topic-schema.ts); the checks below
// follow from that schema and from the rule that patient details stay out of files unless asked.

const fixture = (path: string): string => readFileSync(new URL(`../../../${path}`, import.meta.url), 'utf8');
const DEMOS = [
  'assets/demo/01-kidney-stone.json',
  'assets/demo/02-bowel-screening.json',
  'assets/demo/03-fracture-medicine.json',
];
const VERSION_1 = 'test/fixtures/topics/version-1-blood-pressure.json';

function topicOf(text: string): Topic {
  const reading = readTopicFile(text);
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

/** The message and field of a file that must be refused. */
function refusal(text: string): { field: string; code: string; message: string } {
  const reading = readTopicFile(text);
  if (reading.ok) throw new Error('expected the file to be refused');
  return { field: reading.problem.field, code: reading.problem.code, message: describeProblem(reading.problem) };
}

describe('writing and reading a topic file', () => {
  it.each(DEMOS)('gives back the same topic after writing and reading %s', (path) => {
    const topic = topicOf(fixture(path));
    const again = readTopicFile(writeTopicFile(topic));
    expect(again).toEqual({ ok: true, topic, migratedFrom: null });
  });

  it('writes the current format and version', () => {
    const written = JSON.parse(writeTopicFile(topicOf(fixture(DEMOS[0] ?? '')))) as Record<string, unknown>;
    expect(written.format).toBe(TOPIC_FORMAT);
    expect(written.version).toBe(TOPIC_VERSION);
    expect(Object.keys(written)).toEqual(['format', 'version', 'topic']);
  });

  it('leaves the patient’s details out unless asked to include them', () => {
    const topic: Topic = { ...topicOf(fixture(DEMOS[0] ?? '')), patient: { name: 'Ada Example', reference: 'REF-4417' } };
    const plain = writeTopicFile(topic);
    expect(plain).not.toContain('Ada Example');
    expect(plain).not.toContain('REF-4417');
    expect(topicOf(plain).patient).toBeNull();
    const withPatient = writeTopicFile(topic, { includePatient: true });
    expect(topicOf(withPatient).patient).toEqual({ name: 'Ada Example', reference: 'REF-4417' });
    expect(topicOf(withPatient)).toEqual(topic);
  });

  it('keeps risks as they were typed, text or number', () => {
    const topic = topicOf(fixture(DEMOS[1] ?? ''));
    const risks = topicOf(writeTopicFile(topic)).outcomes.map((outcome) => outcome.baseline.risk);
    expect(risks).toEqual(['2 in 100', '1%', '5 per 10000']);
  });

  it('fills in what a file may leave out: importance, clinician and patient', () => {
    const data = JSON.parse(fixture(DEMOS[0] ?? '')) as {
      topic: Record<string, unknown> & { outcomes: { effects: Record<string, unknown>[] }[] };
    };
    delete data.topic.clinician;
    delete data.topic.patient;
    for (const outcome of data.topic.outcomes) for (const entry of outcome.effects) delete entry.importance;
    const topic = topicOf(JSON.stringify(data));
    expect(topic.clinician).toBe('');
    expect(topic.patient).toBeNull();
    expect(topic.outcomes.flatMap((outcome) => outcome.effects.map((entry) => entry.importance))).toEqual(
      Array(6).fill('important'),
    );
  });

  it('reads a file that starts with a byte-order mark, as some editors save them', () => {
    const text = fixture(DEMOS[0] ?? '');
    expect(topicOf(`\uFEFF${text}`)).toEqual(topicOf(text));
  });
});

describe('reading a version 1 file', () => {
  const migratedTopic: Topic = {
    title: 'Taking a tablet to lower blood pressure (illustrative example)',
    population: 'adults aged 50 to 70 with raised blood pressure and no heart disease',
    periodYears: 5,
    illustrative: true,
    options: [
      { id: 'none', name: 'no tablet', isComparison: true },
      { id: 'tablet', name: 'the tablet', isComparison: false },
    ],
    outcomes: [
      {
        id: 'stroke',
        name: 'a stroke',
        kind: 'benefit',
        isHeadline: true,
        baseline: { risk: '1 in 20', periodYears: 10, source: 'Invented risk table' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'rr', estimate: 0.7, lower: 0.6, upper: 0.82 },
            source: 'Invented pooled trials, for testing only',
            followUpYears: 4,
            certainty: 'moderate',
            importance: 'important',
          },
        ],
      },
      {
        id: 'dizzy',
        name: 'dizziness on standing up',
        kind: 'harm',
        isHeadline: false,
        baseline: { risk: 0.03, periodYears: 5, source: '' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'arr', estimate: -0.02, lower: -0.035, upper: -0.005 },
            source: '',
            followUpYears: null,
            certainty: 'low',
            importance: 'important',
          },
        ],
      },
    ],
    evidence: { summary: 'Invented numbers for testing the reading of old files', reviewed: '2025-06-01' },
    questions: [],
    clinician: '',
    patient: null,
  };

  it('migrates every field to the current shape and says it did', () => {
    expect(readTopicFile(fixture(VERSION_1))).toEqual({ ok: true, topic: migratedTopic, migratedFrom: 1 });
  });

  it('gives a topic that validates and computes', () => {
    const topic = topicOf(fixture(VERSION_1));
    expect(validateTopic(topic)).toEqual([]);
    const evaluation = evaluateTopic(topic);
    expect(evaluation.ok).toBe(true);
    // 1 in 20 over 10 years is 1 − 0.95^(5/10) = 2.53% over 5 years (constant hazard, Fleurence & Hollenbeak 2007).
    expect(evaluation.result?.outcomes[0]?.baselineRisk).toBeCloseTo(1 - Math.sqrt(0.95), 12);
  });

  it('is written back as the current version', () => {
    const again = readTopicFile(writeTopicFile(topicOf(fixture(VERSION_1))));
    expect(again).toEqual({ ok: true, topic: migratedTopic, migratedFrom: null });
  });

  it('makes the first outcome the headline when none is marked', () => {
    const data = JSON.parse(fixture(VERSION_1)) as { outcomes: Record<string, unknown>[] };
    for (const outcome of data.outcomes) delete outcome.headline;
    const topic = migrateTopicV1(v.parse(topicFileV1Schema, data));
    expect(topic.outcomes.map((outcome) => outcome.isHeadline)).toEqual([true, false]);
  });

  it('keeps one headline when a version 1 file marks several', () => {
    const data = JSON.parse(fixture(VERSION_1)) as { outcomes: Record<string, unknown>[] };
    for (const outcome of data.outcomes) outcome.headline = true;
    expect(topicOf(JSON.stringify(data)).outcomes.map((outcome) => outcome.isHeadline)).toEqual([true, false]);
  });

  it('names the first wrong field of a damaged version 1 file in its own layout', () => {
    const data = JSON.parse(fixture(VERSION_1)) as Record<string, unknown>;
    data.years = '5';
    expect(refusal(JSON.stringify(data)).message).toBe(
      'This topic file is damaged at "years": expected a number, found the text "5".',
    );
    const effect = JSON.parse(fixture(VERSION_1)) as { outcomes: { effects: Record<string, { certainty: unknown }> }[] };
    const entry = effect.outcomes[0]?.effects.tablet;
    if (entry !== undefined) entry.certainty = 'sure';
    expect(refusal(JSON.stringify(effect)).message).toBe(
      'This topic file is damaged at "outcomes.0.effects.tablet.certainty": expected one of "high", "moderate", "low" or "very-low", found the text "sure".',
    );
  });
});

describe('reading a file from a newer version', () => {
  it('refuses it and asks for an update', () => {
    const data = JSON.parse(fixture(DEMOS[0] ?? '')) as Record<string, unknown>;
    data.version = 7;
    const found = refusal(JSON.stringify(data));
    expect(found).toMatchObject({ code: 'file-version-unsupported', field: 'version' });
    expect(found.message).toBe(
      'This topic file was made by a newer Chancewise (file version 7; this one reads up to version 6). Update Chancewise to open it; the file has not been changed.',
    );
  });
});

type Data = Record<string, any>;
const base = (): Data => JSON.parse(fixture(DEMOS[0] ?? '')) as Data;
const countsBase = (): Data => JSON.parse(fixture(DEMOS[2] ?? '')) as Data;
const damaged = (edit: (data: Data) => unknown, from: () => Data = base): string => {
  const data = from();
  const replaced = edit(data);
  if (typeof replaced === 'string') return replaced;
  return JSON.stringify(replaced === undefined ? data : replaced);
};
const at = (path: string, expected: string, found: string): string =>
  `This topic file is damaged at "${path}": expected ${expected}, found ${found}.`;
const MEASURES =
  'one of "counts" (trial counts), "rr" (risk ratio), "or" (odds ratio), "hr" (hazard ratio), "rrr" (relative risk reduction) or "arr" (absolute risk reduction)';
const NOT_A_TOPIC = 'This file is not a Chancewise topic (its format is "none").';

/** [what is damaged, the file text, the field, the whole message]. */
const damagedFiles: readonly [string, string, string, string][] = [
  [
    'a title that is a number',
    damaged((d) => {
      d.topic.title = 5;
    }),
    'topic.title',
    at('topic.title', 'text', 'the number 5'),
  ],
  [
    'a missing title',
    damaged((d) => {
      delete d.topic.title;
    }),
    'topic.title',
    at('topic.title', 'text', 'nothing'),
  ],
  [
    'a period written as text',
    damaged((d) => {
      d.topic.periodYears = '10';
    }),
    'topic.periodYears',
    at('topic.periodYears', 'a number', 'the text "10"'),
  ],
  [
    'a period of null',
    damaged((d) => {
      d.topic.periodYears = null;
    }),
    'topic.periodYears',
    at('topic.periodYears', 'a number', 'null'),
  ],
  [
    'an illustrative flag written as text',
    damaged((d) => {
      d.topic.illustrative = 'yes';
    }),
    'topic.illustrative',
    at('topic.illustrative', 'true or false', 'the text "yes"'),
  ],
  [
    'options given as a group instead of a list',
    damaged((d) => {
      d.topic.options = {};
    }),
    'topic.options',
    at('topic.options', 'a list', 'a group of fields'),
  ],
  [
    'an option without its id',
    damaged((d) => {
      delete d.topic.options[1].id;
    }),
    'topic.options.1.id',
    at('topic.options.1.id', 'text', 'nothing'),
  ],
  [
    'a comparison flag written as text',
    damaged((d) => {
      d.topic.options[0].isComparison = 'true';
    }),
    'topic.options.0.isComparison',
    at('topic.options.0.isComparison', 'true or false', 'the text "true"'),
  ],
  [
    'an option given as a list',
    damaged((d) => {
      d.topic.options[2] = ['higher'];
    }),
    'topic.options.2',
    at('topic.options.2', 'a group of fields (id, name, isComparison)', 'a list'),
  ],
  [
    'an unknown kind of outcome',
    damaged((d) => {
      d.topic.outcomes[0].kind = 'good';
    }),
    'topic.outcomes.0.kind',
    at('topic.outcomes.0.kind', '"benefit" or "harm"', 'the text "good"'),
  ],
  [
    'a headline flag that is a number',
    damaged((d) => {
      d.topic.outcomes[0].isHeadline = 1;
    }),
    'topic.outcomes.0.isHeadline',
    at('topic.outcomes.0.isHeadline', 'true or false', 'the number 1'),
  ],
  [
    'an outcome given as a list',
    damaged((d) => {
      d.topic.outcomes[1] = [];
    }),
    'topic.outcomes.1',
    at('topic.outcomes.1', 'a group of fields', 'a list'),
  ],
  [
    'a missing baseline',
    damaged((d) => {
      delete d.topic.outcomes[0].baseline;
    }),
    'topic.outcomes.0.baseline',
    at('topic.outcomes.0.baseline', 'a group of fields (risk, periodYears, periodUnit, source)', 'nothing'),
  ],
  [
    'a baseline risk of true',
    damaged((d) => {
      d.topic.outcomes[0].baseline.risk = true;
    }),
    'topic.outcomes.0.baseline.risk',
    at('topic.outcomes.0.baseline.risk', 'a number, text or null', 'the value true'),
  ],
  [
    'a baseline period written as text',
    damaged((d) => {
      d.topic.outcomes[2].baseline.periodYears = 'ten';
    }),
    'topic.outcomes.2.baseline.periodYears',
    at('topic.outcomes.2.baseline.periodYears', 'a number', 'the text "ten"'),
  ],
  [
    'effects given as a group',
    damaged((d) => {
      d.topic.outcomes[0].effects = {};
    }),
    'topic.outcomes.0.effects',
    at('topic.outcomes.0.effects', 'a list', 'a group of fields'),
  ],
  [
    'an unknown measure name',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect.measure = 'rd';
    }),
    'topic.outcomes.0.effects.0.effect.measure',
    at('topic.outcomes.0.effects.0.effect.measure', MEASURES, 'the text "rd"'),
  ],
  [
    'a measure name in capitals',
    damaged((d) => {
      d.topic.outcomes[1].effects[1].effect.measure = 'RR';
    }),
    'topic.outcomes.1.effects.1.effect.measure',
    at('topic.outcomes.1.effects.1.effect.measure', MEASURES, 'the text "RR"'),
  ],
  [
    'a missing measure',
    damaged((d) => {
      delete d.topic.outcomes[0].effects[0].effect.measure;
    }),
    'topic.outcomes.0.effects.0.effect.measure',
    at('topic.outcomes.0.effects.0.effect.measure', MEASURES, 'nothing'),
  ],
  [
    'an effect written as text',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect = 'rr 0.75';
    }),
    'topic.outcomes.0.effects.0.effect',
    at('topic.outcomes.0.effects.0.effect', 'a group of fields', 'the text "rr 0.75"'),
  ],
  [
    'an estimate written as text',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect.estimate = '0.75';
    }),
    'topic.outcomes.0.effects.0.effect.estimate',
    at('topic.outcomes.0.effects.0.effect.estimate', 'a number', 'the text "0.75"'),
  ],
  [
    'a missing estimate',
    damaged((d) => {
      delete d.topic.outcomes[0].effects[1].effect.estimate;
    }),
    'topic.outcomes.0.effects.1.effect.estimate',
    at('topic.outcomes.0.effects.1.effect.estimate', 'a number', 'nothing'),
  ],
  [
    'an estimate too large to use',
    damaged((d) => JSON.stringify(d).replace('"estimate":0.6', '"estimate":1e400')),
    'topic.outcomes.0.effects.0.effect.estimate',
    at('topic.outcomes.0.effects.0.effect.estimate', 'a number', 'a number too large to use'),
  ],
  [
    'a lower limit written as a word',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect.lower = 'low';
    }),
    'topic.outcomes.0.effects.0.effect.lower',
    at('topic.outcomes.0.effects.0.effect.lower', 'a number or null', 'the text "low"'),
  ],
  [
    'a level written as a percentage',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect.level = '95%';
    }),
    'topic.outcomes.0.effects.0.effect.level',
    at('topic.outcomes.0.effects.0.effect.level', 'a number', 'the text "95%"'),
  ],
  [
    'a follow-up written as text',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].followUpYears = '10';
    }),
    'topic.outcomes.0.effects.0.followUpYears',
    at('topic.outcomes.0.effects.0.followUpYears', 'a number or null', 'the text "10"'),
  ],
  [
    'an unknown certainty',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].certainty = 'medium';
    }),
    'topic.outcomes.0.effects.0.certainty',
    at('topic.outcomes.0.effects.0.certainty', 'one of "high", "moderate", "low" or "very-low"', 'the text "medium"'),
  ],
  [
    'an unknown importance',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].importance = 'big';
    }),
    'topic.outcomes.0.effects.0.importance',
    at('topic.outcomes.0.effects.0.importance', '"important" or "trivial"', 'the text "big"'),
  ],
  [
    'counts that are not whole',
    damaged((d) => {
      d.topic.outcomes[0].effects[0].effect.intervention.events = 52.5;
    }, countsBase),
    'topic.outcomes.0.effects.0.effect.intervention.events',
    at('topic.outcomes.0.effects.0.effect.intervention.events', 'a whole number', 'the number 52.5'),
  ],
  [
    'counts without the comparison arm',
    damaged((d) => {
      delete d.topic.outcomes[0].effects[0].effect.comparison;
    }, countsBase),
    'topic.outcomes.0.effects.0.effect.comparison',
    at('topic.outcomes.0.effects.0.effect.comparison', 'a group of fields (events, total)', 'nothing'),
  ],
  [
    'a total written as text',
    damaged((d) => {
      d.topic.outcomes[1].effects[0].effect.comparison.total = '1000';
    }, countsBase),
    'topic.outcomes.1.effects.0.effect.comparison.total',
    at('topic.outcomes.1.effects.0.effect.comparison.total', 'a whole number', 'the text "1000"'),
  ],
  [
    'questions given as text',
    damaged((d) => {
      d.topic.questions = 'why?';
    }),
    'topic.questions',
    at('topic.questions', 'a list', 'the text "why?"'),
  ],
  [
    'a question that is a number',
    damaged((d) => {
      d.topic.questions[1] = 3;
    }),
    'topic.questions.1',
    at('topic.questions.1', 'text', 'the number 3'),
  ],
  [
    'a missing evidence summary',
    damaged((d) => {
      delete d.topic.evidence;
    }),
    'topic.evidence',
    at('topic.evidence', 'a group of fields (summary, reviewed)', 'nothing'),
  ],
  [
    'a clinician that is a number',
    damaged((d) => {
      d.topic.clinician = 1;
    }),
    'topic.clinician',
    at('topic.clinician', 'text', 'the number 1'),
  ],
  [
    'a patient written as text',
    damaged((d) => {
      d.topic.patient = 'Jane';
    }),
    'topic.patient',
    at('topic.patient', 'a group of fields (name, reference) or null', 'the text "Jane"'),
  ],
  [
    'a long text shortened in the message',
    damaged((d) => {
      d.topic.options[0].isComparison = 'this is a very long piece of text indeed';
    }),
    'topic.options.0.isComparison',
    at('topic.options.0.isComparison', 'true or false', 'the text "this is a very long piece of t…"'),
  ],
  [
    'the topic given as a list',
    damaged((d) => {
      d.topic = [];
    }),
    'topic',
    at('topic', 'a group of fields', 'a list'),
  ],
  [
    'no topic at all',
    damaged((d) => {
      delete d.topic;
    }),
    'topic',
    at('topic', 'a group of fields', 'nothing'),
  ],
  [
    'a version written as text',
    damaged((d) => {
      d.version = '2';
    }),
    'version',
    at('version', 'one of 2, 3, 4, 5 or 6', 'the text "2"'),
  ],
  [
    'a version of 0',
    damaged((d) => {
      d.version = 0;
    }),
    'version',
    at('version', 'one of 2, 3, 4, 5 or 6', 'the number 0'),
  ],
  [
    'a missing version',
    damaged((d) => {
      delete d.version;
    }),
    'version',
    at('version', 'one of 2, 3, 4, 5 or 6', 'nothing'),
  ],
  [
    'the wrong format',
    damaged((d) => {
      d.format = 'spreadsheet';
    }),
    'format',
    'This file is not a Chancewise topic (its format is "spreadsheet").',
  ],
  [
    'no format',
    damaged((d) => {
      delete d.format;
    }),
    'format',
    NOT_A_TOPIC,
  ],
  ['a list instead of a topic file', '[1, 2]', 'format', NOT_A_TOPIC],
  ['a number instead of a topic file', '42', 'format', NOT_A_TOPIC],
  ['null instead of a topic file', 'null', 'format', NOT_A_TOPIC],
  ['text instead of a topic file', '"hello"', 'format', NOT_A_TOPIC],
];

describe('reading a damaged topic file', () => {
  it('checks at least 30 kinds of damage', () => {
    expect(damagedFiles.length).toBeGreaterThanOrEqual(30);
  });

  it.each(damagedFiles)('refuses %s, naming the field and what was expected', (_what, text, field, message) => {
    const found = refusal(text);
    expect(found.field).toBe(field);
    expect(found.message).toBe(message);
    expect(found.message).not.toMatch(/Array|Object|\||undefined|\(\(/);
  });

  it('names only the first wrong field when several are wrong', () => {
    const found = refusal(
      damaged((d) => {
        d.topic.title = 5;
        d.topic.periodYears = 'ten';
      }),
    );
    expect(found.field).toBe('topic.title');
  });

  it.each([
    ['an empty file', ''],
    ['an unfinished object', '{'],
    ['a file cut off in the middle', fixture(DEMOS[0] ?? '').slice(0, 300)],
    ['a file with a trailing comma', '{"format": "chancewise-topic",}'],
  ])('refuses %s as incomplete JSON and suggests a backup', (_what, text) => {
    const found = refusal(text);
    expect(found.code).toBe('file-not-json');
    expect(found.message).toMatch(
      /^This file is not a readable topic: it is not complete JSON \(.+\)\. Open another file or restore a backup\.$/,
    );
  });
});
