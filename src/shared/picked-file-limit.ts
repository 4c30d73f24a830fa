/**
 * The largest file the app reads when a person picks one (a topic or a teaching set): a
 * million characters at up to four UTF-8 bytes each, the desktop shell's topic limit too. A
 * topic file is a few kilobytes, so this only stops a wrong pick (a video, a disk image)
 * before it is read into memory.
 */
export const PICKED_FILE_MAX_BYTES = 4_000_000;
