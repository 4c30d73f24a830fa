/**
 * Printing the handout in a browser: the page's Content-Security-Policy does not let a PDF
 * be shown inside it, so the handout opens in a new tab of its own, where the browser's PDF
 * viewer prints it. The tab is opened at once, while the click still counts as the person's
 * (pop-up blockers allow a tab only then), and shown the PDF once it is made; the policy is
 * left as strict as it is.
 */
import { PlatformFailure } from './platform-failure.ts';

/** The part of `window` that opens a tab. */
export interface TabOpener {
  open(url: string, target: string): PrintTab | null;
}

/** The part of a tab's window used: where it goes, its opener, and closing it. */
export interface PrintTab {
  opener: unknown;
  location: { href: string };
  close(): void;
}

/** How long the handout's address stays valid after the tab is shown it, in milliseconds. */
const ADDRESS_LIFETIME = 60_000;

/**
 * Open a tab, make the PDF, and show it there. Returns true when shown, false when nothing
 * was made (the tab is closed again); throws when the tab was refused or the making failed.
 */
export async function printInNewTab(
  make: () => Promise<Uint8Array | null>,
  opener: TabOpener,
  later: (task: () => void, delay: number) => void = (task, delay) => void setTimeout(task, delay),
): Promise<boolean> {
  const tab = opener.open('', '_blank');
  if (tab === null) throw new PlatformFailure({ kind: 'tab-blocked' });
  // The handout's tab needs nothing from the app: it cannot reach back into it.
  tab.opener = null;
  let pdf: Uint8Array | null;
  try {
    pdf = await make();
  } catch (error) {
    tab.close();
    throw error;
  }
  if (pdf === null) {
    tab.close();
    return false;
  }
  const url = URL.createObjectURL(new Blob([new Uint8Array(pdf)], { type: 'application/pdf' }));
  tab.location.href = url;
  later(() => URL.revokeObjectURL(url), ADDRESS_LIFETIME);
  return true;
}
