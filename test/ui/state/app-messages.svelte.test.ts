import { describe, expect, it } from 'vitest';
import { PlatformFailure } from '../../../src/ui/platform/platform-failure.ts';
import { AppMessages, INFO_MILLISECONDS } from '../../../src/ui/state/app-messages.svelte.ts';

/** Messages whose fading the test runs by hand. */
function setUp() {
  const waiting: { task: () => void; delay: number }[] = [];
  const messages = new AppMessages((task, delay) => waiting.push({ task, delay }));
  return { messages, waiting };
}

describe('AppMessages', () => {
  it('lets information fade after six seconds (common practice: time to read two sentences)', () => {
    const { messages, waiting } = setUp();
    messages.show({ tone: 'info', text: 'Saved “a.cwtopic”.' });
    expect(messages.message?.text).toBe('Saved “a.cwtopic”.');
    expect(waiting.map((entry) => entry.delay)).toEqual([INFO_MILLISECONDS]);
    expect(INFO_MILLISECONDS).toBe(6000);
    waiting[0]?.task();
    expect(messages.message).toBeNull();
  });

  it('keeps an error until it is dismissed', () => {
    const { messages, waiting } = setUp();
    messages.show({ tone: 'error', text: 'The topic was not saved.' });
    expect(waiting).toHaveLength(0);
    expect(messages.message?.tone).toBe('error');
    messages.dismiss();
    expect(messages.message).toBeNull();
  });

  it('never lets an older message’s fading take a newer message away', () => {
    const { messages, waiting } = setUp();
    messages.show({ tone: 'info', text: 'first' });
    messages.show({ tone: 'error', text: 'second' });
    waiting[0]?.task();
    expect(messages.message?.text).toBe('second');
  });

  it('says a failure in the error’s own words, put in the sentence that says what failed and what still holds', () => {
    const { messages } = setUp();
    messages.fail(new Error('the disk is full'), (reason) => `The chart could not be saved: ${reason}.`);
    expect(messages.message).toEqual({ tone: 'error', text: 'The chart could not be saved: the disk is full.' });
    messages.fail('no permission');
    expect(messages.message?.text).toBe('no permission');
  });

  it('says a platform failure in its own words, not the English of the error', () => {
    const messages = new AppMessages(() => undefined, {
      tabBlocked: '[tab blocked]',
      fileTooLarge: (fileName, megabytes, limit) => `[${fileName} ${megabytes} of ${limit}]`,
    });
    messages.fail(new PlatformFailure({ kind: 'tab-blocked' }), (reason) => `<${reason}>`);
    expect(messages.message?.text).toBe('<[tab blocked]>');
    messages.fail(
      new PlatformFailure({ kind: 'file-too-large', fileName: 'film.json', bytes: 5_500_000, limitBytes: 4_000_000 }),
    );
    expect(messages.message?.text).toBe('[film.json 5.5 of 4]');
    // The error itself keeps the English, for logs.
    expect(new PlatformFailure({ kind: 'tab-blocked' }).message).toMatch(/^Your browser did not open a new tab/);
  });
});
