/**
 * The sentence saying how an outcome's baseline was converted to the topic's period, shown
 * beside the baseline's period in the editor and with the outcome's results, so that no
 * conversion happens out of sight.
 */
import { type Catalogue, describeNotice } from '../../core/messages/describe.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';

/** The conversion sentence of one outcome of a result, or null when its baseline was not converted. */
export function baselineConversionSentence(result: TopicResult | null, outcomeId: string, catalogue?: Catalogue): string | null {
  const conversion = result?.outcomes.find((outcome) => outcome.outcomeId === outcomeId)?.baselineConversion ?? null;
  return conversion === null ? null : describeNotice(conversion, catalogue);
}
