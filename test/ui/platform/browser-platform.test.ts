// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { pickTextFile } from '../../../src/ui/platform/browser-platform.ts';

afterEach(() => {
  vi.restoreAllMocks();
});

/** Run pickTextFile with the file input answering as if the person picked `file`. */
function pick(file: File): Promise<unknown> {
  const create = document.createElement.bind(document);
  const answering = (name: string): HTMLElement => {
    const element = create(name);
    if (element instanceof HTMLInputElement) {
      Object.defineProperty(element, 'files', { value: [file] });
      element.click = () => element.dispatchEvent(new Event('change'));
    }
    return element;
  };
  vi.spyOn(document, 'createElement').mockImplementation(answering as typeof document.createElement);
  return pickTextFile('.cwtopic,.json');
}

describe('pickTextFile()', () => {
  it('reads a topic-sized file', async () => {
    await expect(pick(new File(['{"format":"chancewise-topic"}'], 'heart.cwtopic'))).resolves.toEqual({
      name: 'heart.cwtopic',
      text: '{"format":"chancewise-topic"}',
    });
  });

  it('refuses a 500 MiB file with a message saying so, without reading it', async () => {
    const file = new File(['x'], 'holiday-video.json');
    Object.defineProperty(file, 'size', { value: 500 * 1024 * 1024 });
    const text = vi.spyOn(file, 'text');
    await expect(pick(file)).rejects.toThrow(
      '“holiday-video.json” is 524.3 MB, larger than a Chancewise file can be (4 MB), so it was not opened.',
    );
    expect(text).not.toHaveBeenCalled();
  });
});
