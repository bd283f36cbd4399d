// The one script in the app's page itself, run as soon as a first screen the server drew is parsed (seconds
// before the app's code arrives on one bar of signal). It holds a drawn form's send, or a tapped link, until the
// app takes over (client/src/lib/early-form.ts reads what was typed, whether it was sent, where to go), instead of
// letting the browser leave the page and drop the app's code half-downloaded. A page opened through a phone's
// service worker shows the opening text instead: its app is kept on the phone and opens within a second, and the
// page the worker keeps (one copy for every show) may be another show's or out of date.
import { createHash } from 'node:crypto';

/** The built page's opening text (client/index.html): a first screen drawn by the server takes its place. */
export const OPENING = '<p aria-live="polite">Opening…</p>';

export const EARLY_SCRIPT =
  "(function(){var d=document.querySelector('[data-early-path]');if(!d)return;" +
  "if(d.getAttribute('data-early-path')!==location.pathname||navigator.serviceWorker&&navigator.serviceWorker.controller)" +
  `{d.outerHTML=${JSON.stringify(OPENING)};return}` +
  "var n=d.querySelector('[data-early-note]');function held(e){e.preventDefault();if(n)n.hidden=false}" +
  "d.querySelectorAll('form').forEach(function(f){f.addEventListener('submit',function(e){held(e);f.setAttribute('data-early-sent','');if(f.dataset.earlyLookup)look(f)})});" +
  "d.querySelectorAll('a[href]').forEach(function(a){a.addEventListener('click',function(e){held(e);d.setAttribute('data-early-go',a.getAttribute('href'))})});" +
  // A form with a look-up address asks it now (a GET of the person's own session) and shows the answer as text;
  // the answer is kept on the form for the app, which then adds what needs its code (the check-in buttons).
  "function look(f){var i=f.querySelector('input'),w=JSON.parse(f.dataset.earlyWords),b=d.querySelector('[data-early-answer]');" +
  "fetch(f.dataset.earlyLookup+'?'+i.name+'='+encodeURIComponent(i.value),{credentials:'same-origin'}).then(function(r){return r.text().then(function(t){" +
  "var j=JSON.parse(t),c=j.card,e=c&&c.entry;b.textContent='';" +
  "function line(x,k){var p=document.createElement('p');p.textContent=x;if(k)p.className=k;b.appendChild(p)}" +
  "if(!r.ok){line(j.error&&j.error.message||w.failed,'early-alert')}else{f.setAttribute('data-early-reply',t);" +
  "if(e){line(w.number+(e.number==null?'—':e.number),'early-big');line(e.title,'early-title');line(w.cls+e.className);line(w.payment+(w.payments[e.payment]||e.payment))}" +
  "if(c.message)line(c.message,'early-alert')}b.hidden=false})}).catch(function(){})}})();";

/** The script's CSP source: the policy allows this inline script by its hash and no other (CSP 3, §8.4 hash-source). */
export const EARLY_SCRIPT_SOURCE = `'sha256-${createHash('sha256').update(EARLY_SCRIPT).digest('base64')}'`;

/** Helmet's policy with the early script allowed: only the pages that carry it get the wider policy. */
export function policyWithEarlyScript(policy: string): string {
  if (!/(^|;)\s*script-src /.test(policy)) throw new Error(`No script-src to widen in: ${policy}`);
  return policy.replace(/((?:^|;)\s*script-src )/, `$1${EARLY_SCRIPT_SOURCE} `);
}
