// The gate's service worker: the shared offline shell for the gate screen (/gate).
self.PLACARD_OFFLINE_AREA = 'gate';
importScripts('/offline-shell-sw.js');
