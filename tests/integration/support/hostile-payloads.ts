/**
 * Hostile text used by the hostile-* integration suites and tests/e2e/hostile-text.test.ts.
 * Each payload is short enough for the tightest text field it goes into (scenario labels: 80).
 * `inDocument` is what the document sanitiser (api/routes/studies/strip-markup.ts) leaves of it
 * in the editor text: tags that carry behaviour are removed, everything else stays as typed.
 * Every other text field stores the payload exactly (after trimming) and shows it as text.
 */
export interface HostilePayload {
  key: string;
  text: string;
  inDocument: string;
}

export const XSS_PAYLOADS: HostilePayload[] = [
  { key: 'script', text: `<script>alert('xss-script')</script>`, inDocument: '' },
  { key: 'img-onerror', text: `<img src=x onerror="alert('xss-img')">`, inDocument: '' },
  { key: 'svg-onload', text: `<svg/onload=alert('xss-svg')>`, inDocument: '' },
  { key: 'iframe-srcdoc', text: `<iframe srcdoc="<script>alert('xss-frame')</script>"></iframe>`, inDocument: '' },
  // Breaking out of an attribute, then an element the strip list leaves: harmless once shown as text.
  { key: 'attribute-break', text: `"><b onmouseover="alert('xss-attr')">hover</b>`, inDocument: `"><b onmouseover="alert('xss-attr')">hover</b>` },
  { key: 'javascript-url', text: `javascript:alert('xss-url')`, inDocument: `javascript:alert('xss-url')` },
  // Entities must stay entities: decoding them anywhere would turn text into markup.
  { key: 'entities', text: `&lt;script&gt;alert('xss-entity')&lt;/script&gt; &amp; &#60;b&#62;`, inDocument: `&lt;script&gt;alert('xss-entity')&lt;/script&gt; &amp; &#60;b&#62;` },
  // Look-alike angle brackets (fullwidth), a right-to-left override and a zero-width space.
  { key: 'fullwidth', text: `＜script＞alert('xss-wide')＜/script＞`, inDocument: `＜script＞alert('xss-wide')＜/script＞` },
  { key: 'bidi-zero-width', text: `invoice\u202Efdp.csv java\u200Bscript:alert('xss-zw')`, inDocument: `invoice\u202Efdp.csv java\u200Bscript:alert('xss-zw')` },
  { key: 'template', text: `{{constructor.constructor('alert(1)')()}} \${alert('xss-tpl')}`, inDocument: `{{constructor.constructor('alert(1)')()}} \${alert('xss-tpl')}` },
];

/** Quotes, comment starts, LIKE wildcards and backslashes: stored and searched as the characters they are. */
export const SQL_PAYLOADS: string[] = [
  `O'Brien's desk`,
  `x'; DROP TABLE studies; --`,
  `1" OR "1"="1`,
  `100% of 50_000 calls`,
  `back\\slash \\' \\% \\_`,
  `/* comment */ UNION SELECT password_hash FROM users #`,
];

/** `text` with invisible formatting characters removed: how a PDF text extractor reads it. */
export const visible = (text: string): string => text.replace(/[\u200b-\u200f\u202a-\u202e\u2066-\u2069]/g, '');

/** Runs of white space removed: pdftotext breaks long lines wherever the layout did. */
export const squeezed = (text: string): string => text.replace(/\s+/g, '');
