// The preview's own styles, shipped inside the page so that the same markup
// prints the same way from the app and from a static file (the benchmark).
// Print: A4, photo pages on pages of their own, running header and page numbers.

const css = String.raw;

export function reportCss({ running, footer }: { running: string; footer: string }): string {
  return css`
.tw-report { font-family: "Noto Sans", system-ui, sans-serif; color: #1e293b; font-size: 14px; line-height: 1.45; max-width: 820px; margin: 0 auto; background: #fff; }
.tw-report h1 { font-size: 26px; font-weight: 700; color: #12253a; margin: 0; }
.tw-report h2 { font-size: 17px; font-weight: 700; color: #12253a; margin: 24px 0 8px; padding-bottom: 3px; border-bottom: 1px solid #94a3b8; break-after: avoid; }
.tw-report h3, .tw-report h4 { font-weight: 700; margin: 10px 0 4px; }
.tw-report .subtitle { color: #475569; font-size: 16px; margin: 2px 0 12px; }
.tw-report .draft { border: 2px solid #b91c1c; background: #fef2f2; color: #b91c1c; font-weight: 700; text-align: center; padding: 8px; margin: 8px 0 12px; }
.tw-report .box { border: 1px solid #cbd5e1; padding: 10px 12px; }
.tw-report dl.kv { display: grid; grid-template-columns: 190px 1fr; gap: 2px 12px; margin: 0; }
.tw-report dl.kv dt { color: #475569; }
.tw-report dl.kv dd { margin: 0; }
.tw-report table { width: 100%; border-collapse: collapse; font-size: 12.5px; }
.tw-report th { background: #e2e8f0; text-align: left; font-weight: 700; padding: 4px 5px; }
.tw-report td { border-bottom: 1px solid #cbd5e1; padding: 4px 5px; vertical-align: top; }
.tw-report tr { break-inside: avoid; }
.tw-report .total { text-align: right; font-weight: 700; margin-top: 4px; }
.tw-report .note { color: #475569; }
.tw-report .stop { color: #b91c1c; font-weight: 700; }
.tw-report .warning, .tw-report .blockers { border: 1px solid #b45309; background: #fffbeb; padding: 8px; margin-top: 8px; }
.tw-report [data-rating] { display: inline-flex; align-items: center; gap: 6px; white-space: nowrap; font-weight: 700; }
.tw-report [data-swatch] { display: inline-block; flex-shrink: 0; color: #1e293b; }
.tw-report .diagrams { display: grid; grid-template-columns: minmax(0, 300px) 1fr; gap: 12px; align-items: start; }
.tw-report .diagrams .profile { grid-column: 1 / -1; }
.tw-report .remarks p { margin: 0 0 6px; }
.tw-report .remarks ul, .tw-report .remarks ol { margin: 0 0 6px; padding-left: 24px; }
.tw-report .signatures { display: grid; grid-template-columns: 1fr 1fr; gap: 16px; break-inside: avoid; }
.tw-report .signature { border: 1px solid #cbd5e1; padding: 10px; }
.tw-report .signature .mark { height: 64px; border-bottom: 1px solid #334155; display: flex; align-items: flex-end; margin: 6px 0; }
.tw-report .signature .typed { font-size: 24px; font-style: italic; color: #12253a; }
.tw-report .signature .mark img { max-height: 60px; }
.tw-report .photo-page h2 { margin-top: 28px; }
.tw-report .photos { display: grid; grid-template-columns: 1fr 1fr; gap: 14px; }
.tw-report .photos.large { grid-template-columns: 1fr; }
.tw-report figure { margin: 0; break-inside: avoid; }
.tw-report figure img { display: block; width: 100%; height: auto; max-height: 330px; object-fit: contain; background: #f1f5f9; }
.tw-report .photos.large figure img { max-height: 440px; }
.tw-report figcaption { font-size: 12.5px; margin-top: 3px; }
.tw-report figcaption b { display: block; }
.tw-report-toolbar { display: flex; gap: 12px; align-items: center; margin-bottom: 16px; }
.tw-report-toolbar a, .tw-report-toolbar button { border: 1px solid #94a3b8; border-radius: 6px; padding: 4px 12px; background: #fff; color: #12253a; cursor: pointer; font: inherit; text-decoration: none; }
@page {
  size: A4;
  margin: 16mm 12mm 16mm 12mm;
  @top-left { content: ${JSON.stringify(running)}; font-family: "Noto Sans", sans-serif; font-size: 8pt; color: #475569; }
  @bottom-left { content: ${JSON.stringify(footer)}; font-family: "Noto Sans", sans-serif; font-size: 8pt; color: #475569; }
  @bottom-right { content: "Page " counter(page) " of " counter(pages); font-family: "Noto Sans", sans-serif; font-size: 8pt; color: #475569; }
}
@media print {
  body > header, nav, .tw-report-toolbar { display: none !important; }
  main { max-width: none !important; padding: 0 !important; margin: 0 !important; }
  .tw-report { max-width: none; font-size: 10pt; }
  .tw-report .photo-page { break-before: page; }
  .tw-report .photo-page h2 { margin-top: 0; }
  .tw-report figure img { max-height: 95mm; }
  .tw-report .photos.large figure img { max-height: 115mm; }
}
`;
}
