import { describe, expect, test } from 'vitest';
import { EXPORT_NAME_LIMIT, exportFileName, namePart, topicPart } from '../../../src/ui/files/export-file-names.ts';

// Windows refuses < > : " / \ | ? * and control characters in names, and names ending in a space
// or a dot (Microsoft, "Naming Files, Paths, and Namespaces", Win32 documentation); letters,
// digits and hyphens are safe everywhere (common practice).
const SAFE = /^[a-z0-9]+(?:-[a-z0-9]+)*\.(svg|png|pdf)$/;

describe('names of exported files', () => {
  test('a chart is named <topic>-<outcome>, the handout <topic>-handout', () => {
    expect(exportFileName('screening', 'Bowel cancer death', 'svg')).toBe('screening-bowel-cancer-death.svg');
    expect(exportFileName('screening', 'Bowel cancer death', 'png')).toBe('screening-bowel-cancer-death.png');
    expect(exportFileName('screening', 'handout', 'pdf')).toBe('screening-handout.pdf');
  });

  test('the topic’s part is its file’s name without the ending, else its decision’s first words', () => {
    expect(topicPart('Anything', 'screening.cwtopic')).toBe('screening');
    expect(topicPart('Anything', 'Older Topic.chancewise.json')).toBe('older-topic');
    expect(topicPart('Taking a made-up tablet (illustrative example)', null)).toBe('taking-a-made-up-tablet');
    expect(topicPart('¿?', null)).toBe('topic');
  });

  test('each part is lower-case ASCII letters, digits and hyphens: accents are dropped, the rest becomes hyphens', () => {
    expect(namePart('Épaule « gelée » — 2 ans', 'x')).toBe('epaule-gelee-2-ans');
    expect(exportFileName('CON', 'AUX: a/b\\c?', 'svg')).toBe('con-aux-a-b-c.svg');
    expect(exportFileName('***', '', 'png')).toBe('topic-chart.png');
  });

  test('a long name is cut at a hyphen to at most 80 characters in all, keeping the outcome readable', () => {
    const topic = 'a-very-long-decision-about-taking-a-tablet-every-morning-for-the-rest-of-your-life-or-not';
    const outcome = 'a heart attack or a stroke or a hospital stay for heart failure';
    const name = exportFileName(topic, outcome, 'png');
    expect(name.length).toBeLessThanOrEqual(EXPORT_NAME_LIMIT);
    expect(name).toMatch(SAFE);
    expect(name).toBe('a-very-long-decision-about-taking-a-tablet-a-heart-attack-or-a-stroke-or-a.png');
    const word = 'x'.repeat(120);
    expect(exportFileName(word, word, 'svg').length).toBe(EXPORT_NAME_LIMIT);
    expect(exportFileName(word, word, 'svg')).toMatch(SAFE);
  });
});
