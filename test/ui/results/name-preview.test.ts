import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { wordingMessagesEs } from '../../../src/core/messages/es/wording.ts';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import { namePreviews } from '../../../src/ui/results/name-preview.ts';

// The invented, illustrative Spanish demo: a daily tablet for fewer migraine days over 3 months.
function spanishDemo() {
  const reading = readTopicFile(readFileSync(new URL('../../../assets/demo/05-migrana-es.json', import.meta.url), 'utf8'));
  if (!reading.ok) throw new Error('the Spanish demo does not read');
  return computeTopic(reading.topic);
}

describe('the preview of the sentences the typed names go into', () => {
  const previews = namePreviews(topicWording(spanishDemo(), { catalogue: wordingMessagesEs }));

  it('gives each outcome the comparison’s frame, then the option’s frame and change, in the topic’s language', () => {
    expect(previews.map((preview) => preview.outcomeId)).toEqual(['mitad-de-dias', 'cansancio', 'dejarlo']);
    for (const preview of previews) {
      expect(preview.lines).toHaveLength(3);
      expect(preview.lines[0]).toMatch(/^No tomar nada a diario: /);
      expect(preview.lines[1]).toMatch(/^El comprimido diario: /);
      for (const line of preview.lines) expect(line).toContain(preview.outcomeName);
    }
  });

  it('says the people as natural frequencies in Spanish', () => {
    // "de cada 1000" and "personas como usted": the Spanish catalogue's natural frequencies.
    expect(previews[0]?.lines[0]).toContain('de cada 1000 personas como usted');
  });
});
