// The preload of the main window. It runs sandboxed, so it is bundled into one CommonJS
// file whose only import is `electron`; it exposes the shell API and nothing else.
import { contextBridge, ipcRenderer } from 'electron';
import { SHELL_API_KEY } from '../contract/ipc-contract.ts';
import { createShellApi } from './preload-api.ts';

contextBridge.exposeInMainWorld(SHELL_API_KEY, createShellApi(ipcRenderer));
