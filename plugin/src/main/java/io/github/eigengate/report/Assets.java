package io.github.eigengate.report;

/** The constant style sheet and filter script of report.html (no data ever enters these strings). */
final class Assets {

    private Assets() {
    }

    static final String STYLE = """
            :root { --ink:#1d2426; --paper:#f7f5f0; --card:#ffffff; --rule:#d9d4c7; --muted:#6b6a63;
                    --ok:#2e7d5b; --bad:#b23a2a; --warn:#b7791f; --note:#4b5d86; --band:#e9efe6; }
            * { box-sizing: border-box; }
            body { margin:0; background:var(--paper); color:var(--ink);
                   font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; }
            header.eg-top { padding: 18px 32px 14px; border-bottom: 6px solid var(--ok); background:#243034;
                            color:#f1efe8; }
            header.eg-failing { border-bottom-color: var(--bad); }
            .eg-brand { font-size: 12px; letter-spacing: .18em; text-transform: uppercase; color:#b8c4bd; }
            .eg-verdict { margin: 4px 0 6px; font-size: 26px; font-weight: 650; }
            .eg-stamp { display:inline-block; width:34px; height:34px; line-height:34px; text-align:center;
                        border-radius: 6px; background: var(--ok); color:#fff; font-size:22px; }
            .eg-failing .eg-stamp { background: var(--bad); }
            .eg-summary, .eg-datasets { margin: 2px 0; color:#d4dad5; font-size: 13.5px; }
            nav.eg-nav { position: sticky; top:0; z-index:2; background:#e9e5da; border-bottom:1px solid var(--rule);
                         padding: 6px 32px; }
            nav.eg-nav a { margin-right: 18px; color: var(--ink); text-decoration:none; font-weight:600;
                           font-size: 13.5px; }
            nav.eg-nav a:hover { text-decoration: underline; }
            section { padding: 8px 32px 14px; }
            h2 { font-size: 19px; margin: 16px 0 8px; padding-bottom: 4px; border-bottom: 2px solid var(--rule); }
            h3 { font-size: 16px; margin: 0 0 4px; }
            .eg-table { border-collapse: collapse; background: var(--card); width: 100%; font-size: 13.5px;
                        border: 1px solid var(--rule); }
            .eg-table th { text-align:left; background:#efece4; font-weight:600; padding:5px 8px;
                           border-bottom:1px solid var(--rule); }
            .eg-table td { padding:4px 8px; border-bottom:1px solid #ece8de; vertical-align: top; }
            .eg-counts { width:auto; min-width: 60%; }
            .eg-n { text-align:right; font-variant-numeric: tabular-nums; }
            .eg-zero { color:#b3b0a6; }
            td.eg-sev-error { color: var(--bad); font-weight:700; }
            td.eg-sev-warning { color: var(--warn); font-weight:700; }
            td.eg-sev-note { color: var(--note); font-weight:700; }
            .eg-badge { display:inline-block; padding:0 7px; border-radius: 3px; font-size:12px; font-weight:650;
                        color:#fff; background: var(--muted); }
            .eg-badge.eg-sev-error { background: var(--bad); }
            .eg-badge.eg-sev-warning { background: var(--warn); }
            .eg-badge.eg-sev-note { background: var(--note); }
            .eg-badge.eg-ok { background: var(--ok); }
            .eg-findings tr:target { outline: 3px solid #e0b43a; }
            .eg-row-error td:first-child { border-left: 4px solid var(--bad); }
            .eg-row-warning td:first-child { border-left: 4px solid var(--warn); }
            .eg-row-note td:first-child { border-left: 4px solid var(--note); }
            .eg-where, .eg-subject, .eg-value { font-family: ui-monospace, "DejaVu Sans Mono", monospace;
                        font-size: 12.5px; }
            .eg-value { max-width: 240px; overflow-wrap: anywhere; }
            .eg-reason { color: #3a403f; }
            .eg-findings td:nth-child(3), .eg-findings td:nth-child(4) { white-space: nowrap; }
            .eg-filters { display:flex; gap: 16px; align-items:center; padding: 8px 10px; margin-bottom: 8px;
                          background:#ece8dc; border:1px solid var(--rule); border-radius: 4px; font-size: 13.5px; }
            .eg-filters select { font: inherit; padding: 2px 4px; }
            .eg-note { color: var(--muted); font-size: 13px; }
            .eg-none { color: var(--muted); font-style: italic; }
            .eg-check, .eg-form { background: var(--card); border:1px solid var(--rule); border-radius: 5px;
                                  padding: 10px 14px; margin: 0 0 10px; }
            #checks { display:grid; grid-template-columns: repeat(auto-fill, minmax(360px, 1fr)); gap: 10px; }
            #checks h2 { grid-column: 1 / -1; }
            .eg-check { margin:0; }
            .eg-dot { display:inline-block; width:20px; text-align:center; border-radius:50%; color:#fff;
                      font-size: 12px; line-height: 20px; }
            .eg-dot-ok { background: var(--ok); }
            .eg-dot-bad { background: var(--bad); }
            .eg-title { margin: 2px 0; color:#3a403f; font-size: 13.5px; }
            .eg-examined, .eg-meta { margin: 2px 0; color: var(--muted); font-size: 13px; }
            .eg-list { margin: 4px 0 0; padding-left: 18px; font-size: 13px; }
            .eg-tag { margin-left: 10px; font-size: 12px; font-weight:600; padding: 1px 7px; border-radius: 10px;
                      border:1px solid; }
            .eg-tag-cm { color: var(--note); border-color: var(--note); }
            .eg-tag-bad { color: var(--bad); border-color: var(--bad); }
            .eg-plots { display:flex; flex-wrap: wrap; gap: 14px; }
            figure { margin: 6px 0 0; width: 442px; }
            figcaption { font-size: 12.5px; color: var(--muted); }
            svg.eg-plot { background: #fcfbf8; border: 1px solid #e4dfd2; }
            .eg-band { fill: var(--band); }
            .eg-axis { stroke: #8f8c83; stroke-width: 1; }
            .eg-grid { stroke: #b9c7b3; stroke-width: 1; stroke-dasharray: 3 3; }
            .eg-label { font-size: 10.5px; fill: #5e5d57; font-family: system-ui, sans-serif; }
            .eg-pt { fill: #fff; stroke-width: 1.6; }
            .eg-flag { fill: var(--bad); stroke: #fff; stroke-width: 1.5; }
            .eg-flag-label { fill: var(--bad); font-weight: 700; }
            .eg-bar { fill: #9fb7c1; stroke: #6f8f9c; stroke-width: .8; }
            .eg-curve { fill: none; stroke: #c2571a; stroke-width: 2; }
            .eg-zero-observed { stroke: var(--note); stroke-width: 6; }
            .eg-zero-expected { fill: none; stroke: #c2571a; stroke-width: 2; }
            .eg-cover-bg { fill: #e6e1d5; }
            .eg-cover-full { fill: var(--ok); }
            .eg-cover-part { fill: var(--warn); }
            footer { padding: 14px 32px 28px; color: var(--muted); font-size: 12.5px; }
            [hidden] { display: none !important; }
            """;

    /**
     * Shows the filter bar and hides the rows, check cards and form cards the chosen filters exclude. A link ending
     * in {@code #only:check=…&severity=…&form=…} opens the page so filtered, and the bar keeps the address in step.
     */
    static final String SCRIPT = """
            (function () {
              var box = document.getElementById('eg-filters');
              if (!box) { return; }
              box.hidden = false;
              var pick = function (n) { return document.getElementById('eg-filter-' + n); };
              var apply = function () {
                var c = pick('check').value, s = pick('severity').value, f = pick('form').value, shown = 0;
                document.querySelectorAll('tr.eg-finding').forEach(function (tr) {
                  var ok = (!c || tr.dataset.check === c) && (!s || tr.dataset.severity === s)
                        && (!f || tr.dataset.form === f);
                  tr.hidden = !ok; if (ok) { shown++; }
                });
                document.querySelectorAll('article.eg-check').forEach(function (a) {
                  a.hidden = !!c && a.dataset.check !== c;
                });
                document.querySelectorAll('article.eg-form').forEach(function (a) {
                  a.hidden = !!f && a.dataset.form !== f;
                });
                var n = document.getElementById('eg-filter-count');
                if (n) { n.textContent = shown + ' of ' + document.querySelectorAll('tr.eg-finding').length
                         + ' findings shown'; }
              };
              var remember = function () {
                var parts = [];
                ['check', 'severity', 'form'].forEach(function (k) {
                  if (pick(k).value) { parts.push(k + '=' + encodeURIComponent(pick(k).value)); }
                });
                try { history.replaceState(null, '', parts.length ? '#only:' + parts.join('&') : '#findings'); }
                catch (e) { /* a file:// page may refuse; the filters still work */ }
              };
              var hash = location.hash || '';
              if (hash.indexOf('#only:') === 0) {
                hash.slice(6).split('&').forEach(function (kv) {
                  var i = kv.indexOf('='), sel = pick(kv.slice(0, i));
                  if (sel) { sel.value = decodeURIComponent(kv.slice(i + 1)); }
                });
              }
              box.addEventListener('change', function () { apply(); remember(); });
              box.addEventListener('reset', function () { setTimeout(function () { apply(); remember(); }, 0); });
              apply();
            })();
            """;
}
