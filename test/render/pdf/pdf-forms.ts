/**
 * Read the form XObjects of an uncompressed jsPDF document and where its page places them
 * (ISO 32000-1 §8.10 "Form XObjects", §8.4.4 the `cm` operator, §8.8 `Do`).
 */

/** One placement of a form: its name and the translation it was drawn with, in points. */
export interface FormPlacement {
  readonly form: string;
  readonly x: number;
  readonly y: number;
}

/** Each form's content stream, by the name the page's resources give it (/Xo1, /Xo2, …). */
export function formStreams(pdf: string): Map<string, string> {
  const numbers = new Map<string, string>();
  const dictionary = /\/XObject <<([^>]*)>>/.exec(pdf)?.[1] ?? '';
  for (const entry of dictionary.matchAll(/\/(Xo\d+) (\d+) 0 R/g)) numbers.set(entry[2] ?? '', entry[1] ?? '');
  const streams = new Map<string, string>();
  // An object's dictionary, up to its stream, never reaching into the next object.
  for (const object of pdf.matchAll(/(\d+) 0 obj\s*<<((?:(?!endobj)[^])*?)>>\s*stream\r?\n([^]*?)endstream/g)) {
    if (!(object[2] ?? '').includes('/Subtype /Form')) continue;
    const name = numbers.get(object[1] ?? '');
    if (name !== undefined) streams.set(name, object[3] ?? '');
  }
  return streams;
}

/** Every `q 1 0 0 1 x y cm /XoN Do Q` of the page content, in order. */
export function formPlacements(pdf: string): FormPlacement[] {
  return [...pdf.matchAll(/^q\r?\n1\.? 0\.? 0\.? 1\.? (-?[\d.]+) (-?[\d.]+) cm\r?\n\/(Xo\d+) Do\r?\nQ$/gm)].map((found) => ({
    form: found[3] ?? '',
    x: Number(found[1]),
    y: Number(found[2]),
  }));
}

/** The document without its forms' objects: the page's own content and everything else. */
export function pageContent(pdf: string): string {
  return pdf.replace(/\d+ 0 obj\s*<<((?:(?!endobj)[^])*?)>>\s*stream\r?\n[^]*?endstream/g, (object, dictionary: string) =>
    dictionary.includes('/Subtype /Form') ? '' : object,
  );
}
