// Finds the page's own @font-face rules for the chart typeface and turns them into data-URL rules,
// so an exported SVG (and the PNG drawn from it, which cannot reach page fonts) keeps its lettering.

const CHART_FAMILY = 'IBM Plex Sans';
/** The weights the charts use: regular text and semibold titles. */
const WEIGHTS = new Set(['400', '600', 'normal']);

/** Browsers shorten U+0000-00FF to U+0-FF when they read the rule back; both start the basic Latin range. */
function isLatin(rule: CSSFontFaceRule): boolean {
  const range = rule.style.getPropertyValue('unicode-range');
  return !range || /U\+0+-/i.test(range);
}

function fontRules(): CSSFontFaceRule[] {
  const rules: CSSFontFaceRule[] = [];
  for (const sheet of Array.from(document.styleSheets)) {
    let list: CSSRuleList;
    try {
      list = sheet.cssRules;
    } catch {
      continue; // a style sheet from another origin cannot be read; its fonts stay out
    }
    for (const rule of Array.from(list)) {
      if (!(rule instanceof CSSFontFaceRule)) continue;
      const family = rule.style.getPropertyValue('font-family').replace(/["']/g, '').trim();
      const weight = rule.style.getPropertyValue('font-weight').trim() || '400';
      const style = rule.style.getPropertyValue('font-style').trim() || 'normal';
      if (family === CHART_FAMILY && WEIGHTS.has(weight) && style === 'normal' && isLatin(rule)) rules.push(rule);
    }
  }
  return rules;
}

async function toDataUrl(url: string): Promise<string> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`font ${url} answered ${response.status}`);
  const blob = await response.blob();
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error ?? new Error(`font ${url} could not be read`));
    reader.readAsDataURL(blob);
  });
}

/**
 * @font-face CSS with embedded fonts, or '' when the page has none to give; the exported file then
 * falls back to the system sans-serif named in the font stack, which is legible, just not on brand.
 */
export async function collectFontCss(): Promise<string> {
  if (typeof document === 'undefined') return '';
  const parts: string[] = [];
  for (const rule of fontRules()) {
    const match = /url\(["']?([^"')]+\.woff2)["']?\)/.exec(rule.style.getPropertyValue('src'));
    if (!match) continue;
    try {
      const dataUrl = await toDataUrl(new URL(match[1], rule.parentStyleSheet?.href ?? document.baseURI).href);
      const weight = rule.style.getPropertyValue('font-weight').trim() || '400';
      parts.push(
        `@font-face{font-family:"${CHART_FAMILY}";font-style:normal;font-weight:${weight};src:url(${dataUrl}) format("woff2");}`,
      );
    } catch {
      // One missing font file only costs the typeface, never the export.
    }
  }
  return parts.join('\n');
}
