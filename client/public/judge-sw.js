// The judge's service worker: the shared offline shell for the judging screens (/judge).
/* global importScripts -- a service worker loads the shared shell this way */
self.PLACARD_OFFLINE_AREA = 'judge';
importScripts('/offline-shell-sw.js');
