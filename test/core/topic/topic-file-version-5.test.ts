import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile, writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import { TOPIC_VERSION } from '../../../src/core/topic/topic-schema.ts';
import type { Topic, TopicDisclosures, TopicScreening } from '../../../src/core/topic/topic.ts';
import { validateTopic } from '../../../src/core/topic/validate-topic.ts';

// Version 5 of the topic file (Chancewise's own format, src/core/topic/topic-schema.ts) adds the
// disclosures the IPDAS instrument asks a decision aid to give (Elwyn et al. 2009, PLoS ONE 4(3):e4705:
// who developed it, its funding, conflicts of interest, the date to update it) and a screening section
// (Trevena et al. 2013, BMC Med Inform Decis Mak 13 Suppl 2:S7: false reassurance and overdiagnosis).

const folder = (path: string) => new URL(`../../../${path}`, import.meta.url);
const filesIn = (path: string) =>
  readdirSync(folder(path))
    .filter((name) => name.endsWith('.json'))
    .map((name) => `${path}${name}`);
const FILES = [...filesIn('assets/demo/'), ...filesIn('test/fixtures/topics/')];
const text = (path: string) => readFileSync(folder(path), 'utf8');

function read(contents: string): Topic {
  const reading = readTopicFile(contents);
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

function refusal(contents: string): { field: string; message: string } {
  const reading = readTopicFile(contents);
  if (reading.ok) throw new Error('expected the file to be refused');
  return { field: reading.problem.field, message: describeProblem(reading.problem) };
}

const about: TopicDisclosures = {
  preparedBy: 'Riverside practice pharmacists (invented)',
  funding: 'None',
  interests: 'None declared',
  reviewBy: '2028-06-30',
};
const screening: TopicScreening = { positiveLeadsTo: 'a camera test', missedCase: '3 in 1000', overdiagnosis: 0.004 };

/** The file of `topic` with its version changed, as an older Chancewise would have written it. */
const asVersion = (topic: Topic, version: number) => {
  const data = JSON.parse(writeTopicFile(topic)) as { version: number };
  return JSON.stringify({ ...data, version });
};

describe('version 5 topic files', () => {
  it('are followed by version 6, which this build writes', () => {
    expect(TOPIC_VERSION).toBe(6);
    expect((JSON.parse(writeTopicFile(read(text('assets/demo/01-kidney-stone.json')))) as { version: number }).version).toBe(6);
  });

  it('keep the disclosures and the screening section through writing and reading', () => {
    const topic: Topic = { ...read(text('assets/demo/01-kidney-stone.json')), about, screening };
    const written = writeTopicFile(topic);
    const stored = JSON.parse(written) as { topic: { about: unknown; screening: unknown } };
    expect(stored.topic.about).toEqual(about);
    expect(stored.topic.screening).toEqual({ positiveLeadsTo: 'a camera test', missedCase: '3 in 1000', overdiagnosis: 0.004 });
    expect(read(written)).toEqual(topic);
    expect(read(writeTopicFile(read(written)))).toEqual(topic);
  });

  it('write nothing of either for a topic that has neither', () => {
    const written = writeTopicFile(read(text('assets/demo/01-kidney-stone.json')));
    expect(written).not.toMatch(/"about"|"screening"/);
  });

  it('are refused when made by a newer version, as before', () => {
    const found = refusal(asVersion(read(text('assets/demo/01-kidney-stone.json')), 7));
    expect(found.field).toBe('version');
    expect(found.message).toBe(
      'This topic file was made by a newer Chancewise (file version 7; this one reads up to version 6). Update Chancewise to open it; the file has not been changed.',
    );
  });
});

describe('files of versions 1 to 4', () => {
  it.each(FILES)('read %s unchanged, and compute the same results once written as version 5', (path) => {
    const original = readTopicFile(text(path));
    if (!original.ok) throw new Error(describeProblem(original.problem));
    const data = JSON.parse(text(path)) as { version: number };
    expect(data.version === 5 || original.topic.about === undefined).toBe(true);
    const again = read(writeTopicFile(original.topic));
    expect(again).toEqual(original.topic);
    expect(computeTopic(again)).toEqual(computeTopic(original.topic));
  });

  it.each([2, 3, 4])('give the same topic and results when a demo file says version %i', (version) => {
    for (const path of filesIn('assets/demo/')) {
      const plain = read(text(path));
      // Only the screening demo uses version 5's fields; the others read the same under any version 2 to 5.
      if (plain.about !== undefined || plain.screening !== undefined) continue;
      const older = read(asVersion(plain, version));
      expect(older).toEqual(plain);
      expect(computeTopic(older)).toEqual(computeTopic(plain));
    }
  });

  it('migrate a version 1 file to the same results as its version 5 copy', () => {
    const original = read(text('test/fixtures/topics/version-1-blood-pressure.json'));
    const copy = read(writeTopicFile(original));
    expect(copy).toEqual(original);
    expect(computeTopic(copy)).toEqual(computeTopic(original));
  });
});

describe('damaged version 5 fields', () => {
  const base = read(text('assets/demo/01-kidney-stone.json'));
  const damaged = (change: (topic: Record<string, unknown>) => void) => {
    const data = JSON.parse(writeTopicFile({ ...base, about, screening })) as { topic: Record<string, unknown> };
    change(data.topic);
    return JSON.stringify(data);
  };

  it('refuse a disclosure that is not text, naming the field', () => {
    const found = refusal(
      damaged((topic) => {
        (topic.about as Record<string, unknown>).funding = 5;
      }),
    );
    expect(found.field).toBe('topic.about.funding');
    expect(found.message).toBe('This topic file is damaged at "topic.about.funding": expected text, found the number 5.');
  });

  it('refuse disclosures that lack a field, naming it', () => {
    const found = refusal(
      damaged((topic) => {
        delete (topic.about as Record<string, unknown>).reviewBy;
      }),
    );
    expect(found.field).toBe('topic.about.reviewBy');
    expect(found.message).toBe('This topic file is damaged at "topic.about.reviewBy": expected text, found nothing.');
  });

  it('refuse a screening chance that is neither a number, text nor empty', () => {
    const found = refusal(
      damaged((topic) => {
        (topic.screening as Record<string, unknown>).missedCase = true;
      }),
    );
    expect(found.field).toBe('topic.screening.missedCase');
    expect(found.message).toBe(
      'This topic file is damaged at "topic.screening.missedCase": expected a number, text or null, found the value true.',
    );
  });
});

describe('checking the disclosures and the screening section', () => {
  const base = read(text('assets/demo/01-kidney-stone.json'));
  const problemsOf = (topic: Topic) =>
    validateTopic(topic).map((found) => ({ field: found.field, message: describeProblem(found) }));

  it('accepts empty disclosures (the handout says "not stated") and a real review-by date', () => {
    expect(validateTopic({ ...base, about: { preparedBy: '', funding: '', interests: '', reviewBy: '' } })).toEqual([]);
    // 2028 is a leap year (divisible by 4, not by 100): 29 February 2028 exists (ISO 8601 Gregorian calendar).
    expect(validateTopic({ ...base, about: { ...about, reviewBy: '2028-02-29' } })).toEqual([]);
  });

  it('refuses a review-by date not written YYYY-MM-DD, saying how to write it', () => {
    expect(problemsOf({ ...base, about: { ...about, reviewBy: '30/06/2028' } })).toEqual([
      {
        field: 'about.reviewBy',
        message:
          'The review-by date "30/06/2028" is not written as year-month-day. Write it YYYY-MM-DD, for example 2028-06-30, or leave it empty.',
      },
    ]);
  });

  it('refuses a review-by date that is not a day of the calendar', () => {
    // 2027 is not a leap year, so February has 28 days (ISO 8601 Gregorian calendar).
    expect(problemsOf({ ...base, about: { ...about, reviewBy: '2027-02-29' } })).toEqual([
      {
        field: 'about.reviewBy',
        message:
          'The review-by date "2027-02-29" is not a day of the calendar. Check the month and the day, for example 2028-06-30.',
      },
    ]);
  });

  it('refuses a disclosure over its length, saying the limit', () => {
    expect(problemsOf({ ...base, about: { ...about, funding: 'x'.repeat(121) } })).toEqual([
      { field: 'about.funding', message: 'The funding has 121 characters. Shorten it to 120 or fewer.' },
    ]);
  });

  it('refuses a screening chance that is not a risk, with the forms a risk may take', () => {
    expect(problemsOf({ ...base, screening: { ...screening, missedCase: 'a few' } })).toEqual([
      {
        field: 'screening.missedCase',
        message: '"a few" is not a risk. Write it as 20%, 0.2, 20/100, 1 in 5 or 200 per 1000.',
      },
    ]);
    expect(problemsOf({ ...base, screening: { ...screening, overdiagnosis: '12 in 10' } })).toEqual([
      {
        field: 'screening.overdiagnosis',
        message: 'A risk of "12 in 10" is outside 0% to 100%. A risk must lie between 0% and 100%.',
      },
    ]);
  });

  it('accepts a screening section with only some of it given', () => {
    expect(validateTopic({ ...base, screening: { positiveLeadsTo: '', missedCase: null, overdiagnosis: '1 in 250' } })).toEqual(
      [],
    );
  });
});
