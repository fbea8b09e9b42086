/**
 * A small MIME reader for the local outbox: subject, plain text and HTML of a message as
 * nodemailer writes it (RFC 5322 headers, RFC 2047 encoded words, RFC 2045 quoted-printable and
 * base64 bodies, RFC 2046 multipart). Not a general-purpose mail parser.
 */

/** The readable parts of a message. */
export interface ParsedMail {
  subject: string;
  text: string;
  html: string | null;
}

interface MimePart {
  headers: Map<string, string>;
  body: string;
}

function splitPart(raw: string): MimePart {
  const match = /\r?\n\r?\n/.exec(raw);
  const head = match ? raw.slice(0, match.index) : raw;
  const body = match ? raw.slice(match.index + match[0].length) : '';
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0)
      headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function headerParam(value: string, name: string): string | undefined {
  const match = new RegExp(`;\\s*${name}\\s*=\\s*(?:"([^"]*)"|([^;\\s]*))`, 'i').exec(value);
  return match ? (match[1] ?? match[2]) : undefined;
}

function decodeBytes(bytes: Uint8Array, charset: string): string {
  try {
    return new TextDecoder(charset).decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

function quotedPrintableBytes(text: string): Uint8Array {
  const joined = text.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < joined.length; i++) {
    const hex = joined.slice(i + 1, i + 3);
    if (joined[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(Number.parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(joined[i] ?? '', 'utf8'));
    }
  }
  return Uint8Array.from(bytes);
}

/** Decodes RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`) in a header value. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/(=\?[^?]+\?[BbQq]\?[^?]*\?=)\s+(?==\?)/g, '$1')
    .replace(
      /=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g,
      (_all, charset: string, encoding: string, text: string) =>
        encoding.toUpperCase() === 'B'
          ? decodeBytes(Buffer.from(text, 'base64'), charset)
          : decodeBytes(quotedPrintableBytes(text.replace(/_/g, ' ')), charset),
    );
}

function decodeBody(part: MimePart): string {
  const encoding = (part.headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  const charset = headerParam(part.headers.get('content-type') ?? '', 'charset') ?? 'utf-8';
  if (encoding === 'base64')
    return decodeBytes(Buffer.from(part.body.replace(/\s+/g, ''), 'base64'), charset);
  if (encoding === 'quoted-printable') return decodeBytes(quotedPrintableBytes(part.body), charset);
  return part.body;
}

function collectBodies(
  part: MimePart,
  found: { text: string | null; html: string | null },
  depth: number,
): void {
  const type = part.headers.get('content-type') ?? 'text/plain';
  const mediaType = (type.split(';')[0] ?? '').trim().toLowerCase();
  const boundary = headerParam(type, 'boundary');
  if (mediaType.startsWith('multipart/') && boundary && depth < 5) {
    // The line break before a boundary belongs to the delimiter, not to the part (RFC 2046 §5.1.1).
    const escaped = boundary.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
    const sections = part.body.split(new RegExp(`(?:^|\\r?\\n)--${escaped}`)).slice(1);
    for (const section of sections) {
      if (section.startsWith('--')) break;
      collectBodies(splitPart(section.replace(/^\r?\n/, '')), found, depth + 1);
    }
    return;
  }
  if (mediaType === 'text/plain' && found.text === null)
    found.text = decodeBody(part).replace(/\r\n/g, '\n');
  if (mediaType === 'text/html' && found.html === null) found.html = decodeBody(part);
}

/** Reads the subject, plain text and HTML body of a raw message. */
export function parseMailMessage(raw: string): ParsedMail {
  const root = splitPart(raw);
  const found: { text: string | null; html: string | null } = { text: null, html: null };
  collectBodies(root, found, 0);
  return {
    subject: decodeEncodedWords(root.headers.get('subject') ?? ''),
    text: (found.text ?? '').trimEnd(),
    html: found.html,
  };
}
