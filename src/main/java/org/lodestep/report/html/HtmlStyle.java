package org.lodestep.report.html;

/**
 * The one style sheet of every report: calm and legible on screen, on a phone and on A4 paper.
 *
 * <p>Status is carried by a symbol and a word as well as colour, and marked rows get a left rule whose pattern
 * differs by status (solid, dashed, dotted), so grey-scale prints keep their meaning.
 */
final class HtmlStyle {
    private HtmlStyle() {
    }

    static final String CSS = """
            :root{--ink:#1d2733;--muted:#5b6673;--paper:#ffffff;--panel:#f5f4ef;--rule:#d8d5cb;--accent:#2b5d8a;
            --pass:#2f6b3b;--pass-bg:#e7f0e4;--warn:#7d5400;--warn-bg:#fbefd6;--fail:#9e2a1e;--fail-bg:#f7e0dc;
            --info:#2b5d8a;--info-bg:#e4edf5;--prov:#5a3d86;--prov-bg:#ece6f4}
            *{box-sizing:border-box}
            html{-webkit-text-size-adjust:100%}
            body{margin:0;background:var(--panel);color:var(--ink);
            font:16px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Noto Sans","DejaVu Sans",sans-serif}
            .report{max-width:62rem;margin:0 auto;padding:1.25rem 1rem 2rem;background:var(--paper)}
            header.head{border-bottom:2px solid var(--ink);padding-bottom:.75rem;margin-bottom:1rem}
            .kind{margin:0;color:var(--muted);font-size:.85rem;letter-spacing:.06em;text-transform:uppercase}
            h1{margin:.15rem 0 .25rem;font-size:1.6rem;line-height:1.25}
            h2{margin:1.75rem 0 .5rem;font-size:1.2rem;border-bottom:1px solid var(--rule);padding-bottom:.2rem}
            .subtitle{margin:0 0 .5rem;color:var(--muted)}
            dl.meta{display:grid;grid-template-columns:repeat(auto-fit,minmax(11rem,1fr));gap:.35rem 1rem;margin:.5rem 0 0}
            dl.meta div{min-width:0}
            dl.meta dt{font-size:.75rem;color:var(--muted);text-transform:uppercase;letter-spacing:.05em}
            dl.meta dd{margin:0;font-weight:600;overflow-wrap:break-word}
            .verdict{display:flex;gap:.75rem;align-items:flex-start;padding:.75rem 1rem;margin:1rem 0;
            border-left:.5rem solid;border-radius:.25rem}
            .verdict .mark{font-size:1.6rem;line-height:1}
            .verdict .word{white-space:nowrap;font-weight:700;text-transform:uppercase;letter-spacing:.05em;margin-right:.5rem}
            .verdict p{margin:.2rem 0 0}
            .st-pass{color:var(--pass)} .st-warn{color:var(--warn)} .st-fail{color:var(--fail)} .st-info{color:var(--info)}
            .st-provisional{color:var(--prov)}
            .verdict.st-pass{background:var(--pass-bg);border-left-style:solid}
            .verdict.st-warn{background:var(--warn-bg);border-left-style:dashed}
            .verdict.st-fail{background:var(--fail-bg);border-left-style:double}
            .verdict.st-info{background:var(--info-bg);border-left-style:solid}
            .verdict.st-provisional{background:var(--prov-bg);border-left-style:dotted}
            .verdict .answer{margin:.35rem 0 0;font-size:1.05rem;font-weight:600;font-variant-numeric:tabular-nums}
            .verdict .text{color:var(--ink);min-width:0}
            p{margin:.5rem 0}
            .table-wrap{overflow-x:auto;margin:.5rem 0 1rem}
            table{border-collapse:collapse;width:100%;font-size:.92rem}
            caption{text-align:left;font-weight:600;padding:.25rem 0}
            th,td{padding:.35rem .6rem;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}
            thead th{border-bottom:2px solid var(--ink);font-size:.8rem;color:var(--muted);white-space:nowrap}
            td.num,th.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
            td.st{font-weight:600;white-space:nowrap}
            tr.row-st-fail td:first-child{border-left:.35rem solid var(--fail)}
            tr.row-st-warn td:first-child{border-left:.35rem dashed var(--warn)}
            tr.row-st-pass td:first-child{border-left:.35rem dotted var(--pass)}
            tr.row-st-provisional td:first-child{border-left:.35rem double var(--prov)}
            tr.row-st-fail{background:var(--fail-bg)}
            ul.findings{list-style:none;padding:0;margin:.5rem 0}
            ul.findings li{padding:.35rem .5rem;border-bottom:1px solid var(--rule);display:flex;gap:.5rem}
            ul.findings .mark{flex:0 0 1.2rem;font-weight:700}
            ul.findings .word{font-weight:600;flex:0 0 6.2rem;white-space:nowrap}
            ul.findings .text{color:var(--ink);min-width:0;flex:1 1 auto}
            dl.facts{display:grid;grid-template-columns:repeat(auto-fit,minmax(16rem,1fr));gap:0 1.25rem;margin:.5rem 0 1rem}
            dl.facts div{display:flex;justify-content:space-between;gap:1rem;border-bottom:1px dotted var(--rule);padding:.3rem 0}
            dl.facts dt{color:var(--muted);min-width:0;overflow-wrap:break-word;hyphens:manual}
            dl.facts dd{margin:0;font-weight:600;text-align:right;font-variant-numeric:tabular-nums;min-width:0;
            overflow-wrap:break-word}
            h1,h2,p,li,figcaption,aside,td{overflow-wrap:break-word;word-break:normal;hyphens:manual}
            .token{overflow-wrap:anywhere;font-family:ui-monospace,"DejaVu Sans Mono",monospace;font-size:.85em}
            figure{margin:1rem 0;padding:.5rem;border:1px solid var(--rule);border-radius:.25rem;background:#fff}
            figure svg{display:block;width:100%;height:auto;max-width:100%}
            figure svg.wiring{max-width:46rem;margin:0 auto}
            figcaption{font-size:.88rem;color:var(--muted);padding:.4rem .25rem 0}
            figcaption strong{color:var(--ink)}
            aside.safety{margin:1rem 0;padding:.6rem .9rem;border:2px solid var(--warn);border-radius:.25rem;background:#fffaf0}
            aside.safety h3{margin:0 0 .25rem;font-size:1rem}
            aside.safety h3::before{content:"\\26A0\\FE0E  ";font-weight:700}
            aside.safety p{margin:0;font-size:.92rem}
            .provenance-line{margin:.4rem 0 0;font-size:.8rem;color:var(--muted)}
            dl.prov{grid-template-columns:1fr}
            dl.prov div{display:grid;grid-template-columns:minmax(6rem,10rem) minmax(0,1fr);gap:.75rem}
            dl.prov dd{text-align:left;font-weight:400}
            table.files td.token{font-size:.8rem}
            footer{margin-top:2rem;padding-top:.5rem;border-top:1px solid var(--rule);color:var(--muted);font-size:.8rem}
            @media (max-width:40rem){body{font-size:15px}.report{padding:.75rem .6rem}h1{font-size:1.3rem}
            th,td{padding:.3rem .4rem}}
            @media screen and (max-width:40rem){
            table.stack thead{display:none}
            table.stack,table.stack tbody,table.stack tr,table.stack td{display:block;width:100%}
            table.stack tr{border-bottom:2px solid var(--rule);padding:.2rem 0}
            table.stack td{border:0;display:flex;justify-content:space-between;gap:1rem;text-align:right;
            white-space:normal;padding:.15rem .4rem}
            table.stack td:not(.num){text-align:left}
            table.stack td::before{content:attr(data-label);color:var(--muted);font-size:.8rem;text-align:left;
            font-weight:400;flex:0 1 45%}
            table.stack tr[class^="row-st-"] td:first-child{border-left-width:.35rem}
            table:not(.stack) th:first-child,table:not(.stack) td:first-child{position:sticky;left:0;
            background:var(--paper)}
            table:not(.stack) tr.row-st-fail td:first-child{background:var(--fail-bg)}}
            @page{size:A4;margin:14mm 12mm}
            @media print{body{background:#fff;font-size:10pt}.report{max-width:none;padding:0}
            *{-webkit-print-color-adjust:exact;print-color-adjust:exact}
            figure,table,aside,.verdict,dl.facts div{break-inside:avoid}h2,h3{break-after:avoid}
            .table-wrap{overflow:visible}header.head{break-after:avoid}.verdict{break-after:avoid}
            aside.safety{padding:.3rem .6rem;margin:.5rem 0}aside.safety p{font-size:8.5pt}
            .safety-notes{display:flex;gap:.5rem}.safety-notes aside.safety{flex:1 1 0;margin:.4rem 0}
            h2{margin:.9rem 0 .3rem}figure{margin:.5rem 0;padding:.3rem}h1{font-size:16pt}dl.meta dd{font-size:9pt}.verdict{padding:.5rem .8rem;margin:.6rem 0}
            figcaption{font-size:8.5pt}.verdict p{font-size:9.5pt}header.head{padding-bottom:.4rem;margin-bottom:.5rem}
            figure svg.wiring{max-height:95mm;width:auto;max-width:100%}
            .provenance-line a{display:none}}
            """;
}
