// The judge's service worker: the shared offline shell for the judging screens (/judge).
self.PLACARD_OFFLINE_AREA = 'judge';
importScripts('/offline-shell-sw.js');
