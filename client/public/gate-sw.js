// The gate's service worker: the shared offline shell for the gate screen (/gate).
/* global importScripts -- a service worker loads the shared shell this way */
self.PLACARD_OFFLINE_AREA = 'gate';
importScripts('/offline-shell-sw.js');
