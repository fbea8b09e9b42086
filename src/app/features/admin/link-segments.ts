/** A run of plain text, or a web link to show as an anchor. */
export interface TextSegment {
  readonly text: string;
  /** Set when the text is an http(s) URL. */
  readonly href?: string;
}

const URL_PATTERN = /https?:\/\/[^\s<>"]+/g;
/** Sentence punctuation that ends a link written in prose rather than belonging to it. */
const TRAILING_PUNCTUATION = /[.,;:!?)\]]+$/;

/** Splits plain text into text and link segments, so a template can render links without innerHTML. */
export function linkSegments(text: string): TextSegment[] {
  const segments: TextSegment[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const url = match[0].replace(TRAILING_PUNCTUATION, '');
    const start = match.index;
    if (start > last) segments.push({ text: text.slice(last, start) });
    segments.push({ text: url, href: url });
    last = start + url.length;
  }
  if (last < text.length) segments.push({ text: text.slice(last) });
  return segments;
}
