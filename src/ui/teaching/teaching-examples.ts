/**
 * The example teaching sets shipped in assets/teaching, as file text, in file-name order.
 */

export interface ExampleSet {
  readonly fileName: string;
  readonly text: string;
}

const files = import.meta.glob<string>('../../../assets/teaching/*.json', { eager: true, query: '?raw', import: 'default' });

/** Every example set shipped with the app. */
export const EXAMPLE_SETS: readonly ExampleSet[] = Object.keys(files)
  .sort()
  .map((path) => ({ fileName: path.slice(path.lastIndexOf('/') + 1), text: files[path] ?? '' }));
