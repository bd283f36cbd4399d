// The log's and the questions' part of the public stylesheet (added to PAGE_CSS, still one inline sheet).
export const BUILD_LOG_CSS = `
.lt p{margin:0 0 10px}
ol.log{list-style:none;margin:0;padding:0}
ol.log>li{border-top:1px solid var(--rule);padding:10px 0}
ol.log>li:first-child{border-top:0;padding-top:4px}
ol.log h3{margin:0;font-size:1.1rem}
.when{margin:0;color:var(--graphite);font-size:.875rem}
.lph{list-style:none;margin:8px 0;padding:0;display:grid;grid-template-columns:repeat(auto-fill,minmax(140px,1fr));gap:6px}
.lph img{display:block;width:100%;height:auto;background:var(--rule)}
.more{display:inline-block;min-height:44px;line-height:44px;font-weight:600}
dl.qa{margin:0}
dl.qa dt{font-weight:700;margin:0;padding-top:10px;border-top:1px solid var(--rule)}
dl.qa div:first-child dt{border-top:0;padding-top:4px}
dl.qa dd{margin:4px 0 10px}
.often{color:var(--graphite);font-size:.875rem;font-weight:400}
.ask{margin-top:16px}
.ask label{display:block;font-weight:600;margin:0 0 4px}
.ask textarea{display:block;width:100%;min-height:96px;font:inherit;padding:8px;border:1px solid var(--graphite);background:#fff;color:var(--ink)}
.ask button{margin-top:8px;min-height:48px;padding:8px 20px;border:0;background:var(--ink);color:var(--paper);font:600 1.1rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase;letter-spacing:.04em;cursor:pointer}
.ask .hp{position:absolute;left:-10000px;width:1px;height:1px;overflow:hidden}
.ask small{display:block;color:var(--graphite);margin-top:6px}`;
