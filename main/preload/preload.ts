// The preload script (bundled to dist/main/preload.cjs, runs sandboxed beside the page). It exposes
// exactly one object, window.lanewright, through contextBridge; the page never sees ipcRenderer.

import { contextBridge, ipcRenderer } from 'electron';
import { HOST_GLOBAL } from '../ipc/contract';
import { createHostApi } from './host-api';

contextBridge.exposeInMainWorld(HOST_GLOBAL, createHostApi(ipcRenderer));
