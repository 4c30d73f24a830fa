import { app } from 'electron';
import { readJsonFile, writeJsonFile } from '../files/json-file.ts';
import type { PendingWork } from '../pending-work.ts';
import { addRecentFile, parseRecentFiles } from './recent-files.ts';

/** Where the recent list is kept, and who hears when it changes. */
export interface RecentFilesSettings {
  /** The JSON file holding the list (in the user-data folder). */
  readonly filePath: string;
  /** Writes of the list are tracked here, so quitting waits for them. */
  readonly pending: PendingWork;
  /** Called after every change (the menu lists the files). */
  readonly onChange: () => void;
}

/**
 * The files the person opened or saved lately: the one list the menu shows, the one list
 * "open recent" may open from, and the only files a restored snapshot may be saved back to
 * without a dialog. Every change is written to disk and told to the system's own list.
 */
export interface RecentFiles {
  /** The files, most recent first. */
  list(): readonly string[];
  includes(filePath: string): boolean;
  /** Put a file first (opened or saved). */
  remember(filePath: string): void;
  /** Drop a file that could not be read. */
  forget(filePath: string): void;
  /** Empty the list (the menu's "Clear"). */
  clear(): void;
}

/** Read the stored list (anything unreadable gives an empty list) and keep it from now on. */
export async function loadRecentFiles(settings: RecentFilesSettings): Promise<RecentFiles> {
  let files = parseRecentFiles(await readJsonFile(settings.filePath));

  const store = (next: string[]): void => {
    files = next;
    void settings.pending.track(writeJsonFile(settings.filePath, files));
    settings.onChange();
  };

  return {
    list: () => files,
    includes: (filePath) => files.includes(filePath),
    remember(filePath) {
      app.addRecentDocument(filePath);
      store(addRecentFile(files, filePath));
    },
    forget(filePath) {
      store(files.filter((item) => item !== filePath));
    },
    clear() {
      app.clearRecentDocuments();
      store([]);
    },
  };
}
