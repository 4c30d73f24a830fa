// @vitest-environment node
import { describe, expect, it } from 'vitest';
import {
  hasOpenableExtension,
  topicPathFromCommandLine,
  TOPIC_EXTENSION,
  withTopicExtension,
} from '../../../../electron/main/document/topic-file-type.ts';

describe('the topic file type', () => {
  it('is .cwtopic, a single extension the desktops can associate', () => {
    expect(TOPIC_EXTENSION).toBe('cwtopic');
    expect(hasOpenableExtension('Heart.CWTOPIC')).toBe(true);
    expect(hasOpenableExtension('demo.json')).toBe(true);
    expect(hasOpenableExtension('notes.txt')).toBe(false);
    expect(hasOpenableExtension('cwtopic')).toBe(false);
  });

  it('adds the extension to a save name that lacks one', () => {
    expect(withTopicExtension('/h/heart')).toBe('/h/heart.cwtopic');
    expect(withTopicExtension('/h/heart.cwtopic')).toBe('/h/heart.cwtopic');
    expect(withTopicExtension('/h/heart.json')).toBe('/h/heart.json');
    expect(withTopicExtension('/h/heart.txt')).toBe('/h/heart.txt.cwtopic');
  });
});

describe('topicPathFromCommandLine()', () => {
  // Electron docs (app.md, 'second-instance'): the second launch's argv and working directory are passed
  // on; unpackaged runs have the app folder as argv[1] (docs/tutorial/launch-app-from-url-in-another-app.md, from memory).

  it('finds the file after the executable of a packaged app', () => {
    expect(topicPathFromCommandLine(['/opt/Chancewise/chancewise', 'heart.cwtopic'], '/home/a', true)).toBe(
      '/home/a/heart.cwtopic',
    );
  });

  it('skips the app folder of an unpackaged run, and every switch', () => {
    const argv = ['/x/electron', '.', '--inspect=0', '--remote-debugging-port=0', '-r', '/tmp/loader.js', '/data/demo.json'];
    expect(topicPathFromCommandLine(argv, '/work', false)).toBe('/data/demo.json');
  });

  it('converts the file address a Linux desktop passes', () => {
    expect(topicPathFromCommandLine(['/opt/c', 'file:///home/a/My%20topic.cwtopic'], '/', true)).toBe('/home/a/My topic.cwtopic');
  });

  it('gives null when no argument is a topic file', () => {
    expect(topicPathFromCommandLine(['/opt/c'], '/', true)).toBeNull();
    expect(
      topicPathFromCommandLine(['/opt/c', '--allow-file-access-from-files', 'notes.txt', 'a\u0000.cwtopic'], '/', true),
    ).toBeNull();
    expect(topicPathFromCommandLine(['/opt/c', '--file=evil.cwtopic'], '/', true)).toBeNull();
  });
});
