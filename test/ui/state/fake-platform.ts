/** A platform for the state tests: memory storage, and files the test hands over or receives. */
import type {
  OpenedFile,
  Platform,
  PlatformCommand,
  PlatformDocument,
  PlatformEvents,
} from '../../../src/ui/platform/platform.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';

export interface FakePlatform extends Platform {
  /** The next file the person picks; null cancels. */
  picked: OpenedFile | null | Error;
  /** What saving answers: the name used, null (cancelled), or a failure. */
  saveAnswer: (name: string) => string | null | Error;
  readonly savedTopics: { readonly text: string; readonly name: string; readonly mode: 'save' | 'save-as' }[];
  readonly savedFiles: { readonly name: string; readonly contents: string | Uint8Array; readonly type: string }[];
  readonly savedHandouts: { readonly name: string; readonly pdf: Uint8Array }[];
  /** Handouts sent to print, by name. */
  readonly printedHandouts: { readonly name: string; readonly pdf: Uint8Array }[];
  readonly recentPathsOpened: string[];
  replaced: number;
  /** Send a menu command or a document as the desktop shell would. */
  send(event: PlatformCommand | PlatformDocument): void;
}

function answer<T>(value: T | Error): Promise<T> {
  return value instanceof Error ? Promise.reject(value) : Promise.resolve(value);
}

export function fakePlatform(kind: 'browser' | 'desktop' = 'browser', storage = new MemoryStorage()): FakePlatform {
  let events: PlatformEvents | null = null;
  const platform: FakePlatform = {
    kind,
    storage,
    namesFilesItself: kind === 'desktop',
    picked: null,
    saveAnswer: (name) => name,
    savedTopics: [],
    savedFiles: [],
    savedHandouts: [],
    printedHandouts: [],
    recentPathsOpened: [],
    replaced: 0,
    openTopicFile: () => answer(platform.picked),
    openRecentTopicFile: (path) => {
      platform.recentPathsOpened.push(path);
      return answer(platform.picked);
    },
    saveTopicFile: (text, name, mode) => {
      platform.savedTopics.push({ text, name, mode });
      return answer(platform.saveAnswer(name));
    },
    pickTextFile: () => answer(platform.picked),
    saveFile: (name, contents, type) => {
      platform.savedFiles.push({ name, contents, type });
      return answer(platform.saveAnswer(name));
    },
    saveHandout: (name, pdf) => {
      platform.savedHandouts.push({ name, pdf });
      return answer(platform.saveAnswer(name));
    },
    printHandout: async (name, make) => {
      const pdf = await make();
      if (pdf === null) return null;
      platform.printedHandouts.push({ name, pdf });
      return answer(platform.saveAnswer(name));
    },
    topicReplaced: () => {
      platform.replaced += 1;
    },
    snapshot: () => undefined,
    connect: (given) => {
      events = given;
    },
    send: (event) => {
      if (events === null) throw new Error('the app has not connected to the platform');
      if ('kind' in event) events.document(event);
      else events.command(event);
    },
  };
  return platform;
}

/** Let promises that are already settled run their continuations. */
export const settle = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));
