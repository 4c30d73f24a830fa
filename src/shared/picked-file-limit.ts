/**
 * The largest file the app reads when a person picks one (a topic or a teaching set): a
 * million characters at up to four UTF-8 bytes each, the desktop shell's topic limit too. A
 * topic file is a few kilobytes, so this only stops a wrong pick (a video, a disk image)
 * before it is read into memory.
 */
export const PICKED_FILE_MAX_BYTES = 4_000_000;

/** The sentence for a file over the limit, with what to do. */
export function pickedFileTooLargeMessage(name: string, bytes: number): string {
  const megabytes = (bytes / 1_000_000).toFixed(1);
  return `“${name}” is ${megabytes} MB, larger than a Chancewise file can be (4 MB), so it was not opened. Choose a topic or teaching set file.`;
}
