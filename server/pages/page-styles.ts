// The public page's whole stylesheet, inlined: one request, nothing to wait for on a weak signal.
// Placard's look: warm paper, ink, thin rules, one signal accent; Oswald from our own origin.
export const OSWALD_URL = '/c/_/oswald-600.woff2';

export const PAGE_CSS = `@font-face{font-family:Oswald;font-weight:600;font-display:swap;src:url(${OSWALD_URL}) format("woff2")}
/* --signal is for marks and lines; text in the accent uses --signal-ink, which reads at 5.3:1 on paper (WCAG AA is 4.5:1). */
:root{--paper:#F5F0E6;--ink:#1C1B19;--graphite:#55524C;--rule:#D8D0C0;--signal:#D9481C;--signal-ink:#B3390F}
*{box-sizing:border-box}
html{background:var(--paper);color:var(--ink);font:16px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Helvetica Neue",Arial,sans-serif;-webkit-text-size-adjust:100%}
body{margin:0;overflow-wrap:break-word}
a{color:inherit}
h1,h2,.d{font-family:Oswald,"Arial Narrow","Roboto Condensed",sans-serif;font-weight:600;letter-spacing:.01em;text-transform:uppercase;line-height:1.1}
.bar{display:flex;justify-content:space-between;align-items:center;gap:8px;padding:8px 16px;border-bottom:1px solid var(--rule)}
.brand{font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;letter-spacing:.12em;text-decoration:none}
.units a{display:inline-block;min-height:44px;line-height:44px;padding:0 10px;text-decoration:none;color:var(--graphite)}
.units a[aria-current]{color:var(--ink);font-weight:700;border-bottom:3px solid var(--signal)}
main{max-width:760px;margin:0 auto;padding:0 16px 32px}
.cover{margin:0 -16px}
.cover img{display:block;width:100%;height:auto;max-height:min(56vh,560px);object-fit:cover;background:var(--rule)}
.big{display:block}
.kicker{display:block;color:var(--signal-ink);font-size:1rem;letter-spacing:.08em}
h1{font-size:clamp(2rem,9vw,3.4rem);margin:16px 0 4px}
.by{margin:0;color:var(--graphite)}
.fig{display:grid;grid-template-columns:repeat(auto-fit,minmax(140px,1fr));gap:0;margin:20px 0 8px;border-top:3px solid var(--ink)}
.fig div{padding:8px 10px 10px 0;border-bottom:1px solid var(--rule)}
.fig dt{font-size:.875rem;letter-spacing:.08em;text-transform:uppercase;color:var(--graphite)}
.fig dd{margin:0;font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;font-size:1.9rem;line-height:1.15;font-variant-numeric:tabular-nums}
.fig small,.mk{font-size:.875rem;color:var(--graphite);display:block;font-family:system-ui,sans-serif;font-weight:400}
.mk{display:inline;color:var(--signal-ink);font-weight:700;text-transform:uppercase;letter-spacing:.04em}
.eng{font-weight:600;margin:8px 0 0}
section{margin-top:28px}
h2{font-size:1.35rem;margin:0 0 8px;padding-bottom:4px;border-bottom:1px solid var(--ink)}
.story p{margin:0 0 12px}
dl.spec{margin:0;display:grid;grid-template-columns:minmax(110px,35%) minmax(0,1fr)}
/* A web address or a part number with no spaces wraps instead of widening the page on a phone. */
dl.spec dt,dl.spec dd{margin:0;padding:6px 0;border-bottom:1px solid var(--rule);overflow-wrap:anywhere}
dl.spec dt{color:var(--graphite);padding-right:12px}
dl.spec dd{font-variant-numeric:tabular-nums}
.made,.why{margin:8px 0 0;color:var(--graphite)}
.why{font-style:italic}
.sketch{margin:12px 0 0;max-width:420px}.sketch svg{display:block;background:#fff;border:1px solid var(--rule)}.sketch figcaption{font-size:.875rem;color:var(--graphite)}
.care{margin:8px 0 0;padding:8px 10px;border-left:3px solid var(--signal);background:#fff8;font-size:.875rem;color:var(--graphite)}
.dyno svg{width:100%;height:auto;display:block;background:#fff;border:1px solid var(--rule)}
.dyno p{font-size:.875rem;color:var(--graphite);margin:6px 0 0}
.nw{white-space:nowrap}
ol.runs{list-style:none;margin:12px 0 0;padding:0}
ol.runs li{border-top:1px solid var(--rule);padding:8px 0}
ol.runs .how{margin:0;color:var(--graphite);font-size:.875rem}
ol.runs dl{display:grid;grid-template-columns:1fr 1fr;gap:0 12px;margin:4px 0 0}
ol.runs dt{font-size:.875rem;letter-spacing:.06em;text-transform:uppercase;color:var(--graphite)}
ol.runs dd{margin:0;font:600 1.35rem/1.2 Oswald,"Arial Narrow",sans-serif;font-variant-numeric:tabular-nums}
ol.runs small{display:block;font:400 .875rem system-ui,sans-serif;color:var(--graphite)}
table{border-collapse:collapse;width:100%;font-variant-numeric:tabular-nums}
th,td{text-align:left;padding:6px 8px 6px 0;border-bottom:1px solid var(--rule);vertical-align:top}
th{font-weight:600;color:var(--graphite);font-size:.875rem}
.gal{list-style:none;margin:0;padding:0;display:grid;grid-template-columns:repeat(auto-fill,minmax(220px,1fr));gap:8px}
.gal img{display:block;width:100%;height:auto;background:var(--rule)}
.gal figcaption{font-size:.875rem;color:var(--graphite);padding:4px 0}
.gal figure{margin:0}
.show{border:2px solid var(--ink);padding:12px;margin-top:20px}
.vote{margin-top:12px;padding-top:12px;border-top:1px solid var(--rule)}
.vote form{margin:0}
.vbtn{display:block;width:100%;min-height:64px;padding:12px 16px;border:0;background:var(--signal);color:#fff;font:600 1.5rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase;letter-spacing:.04em;cursor:pointer}
.vbtn:focus-visible{outline:3px solid var(--ink);outline-offset:3px}
.vnote{margin:8px 0 0;font-size:.875rem;color:var(--graphite)}
.voted{margin:0;padding:10px 12px;border-left:4px solid #2E7D4F;background:#fff8}
.vote-open{margin:20px 0 0;padding:10px 12px;border-left:4px solid var(--signal);background:#fff8;font-weight:600}
footer{max-width:760px;margin:0 auto;padding:16px;border-top:1px solid var(--rule);font-size:.8rem;color:var(--graphite)}
@media (min-width:800px){.cover{margin:16px 0 0}}
.preview{margin:0;padding:10px 16px;background:#1C1B19;color:#F5F0E6;font-size:15px;text-align:center}`;
