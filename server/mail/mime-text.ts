/** The parts of a caught message that people read. */
export interface ReadableMail {
  subject: string;
  text: string;
}

interface Part {
  headers: Map<string, string>;
  body: string;
}

function splitPart(raw: string): Part {
  const normalized = raw.replace(/\r\n/g, '\n');
  const end = normalized.indexOf('\n\n');
  const head = end < 0 ? normalized : normalized.slice(0, end);
  const body = end < 0 ? '' : normalized.slice(end + 2);
  const headers = new Map<string, string>();
  // Folded header lines (RFC 5322, section 2.2.3) continue with whitespace.
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function param(header: string, name: string): string | undefined {
  const match = new RegExp(`${name}="?([^";]+)"?`, 'i').exec(header);
  return match?.[1];
}

function bytesToText(bytes: Uint8Array, charset = 'utf-8'): string {
  try {
    return new TextDecoder(charset).decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

/** Quoted-printable (RFC 2045, section 6.7): soft line breaks removed, =XX octets restored. */
export function decodeQuotedPrintable(body: string, charset?: string): string {
  const joined = body.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < joined.length; i++) {
    const c = joined[i] ?? '';
    const hex = joined.slice(i + 1, i + 3);
    if (c === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      for (const b of new TextEncoder().encode(c)) bytes.push(b);
    }
  }
  return bytesToText(Uint8Array.from(bytes), charset);
}

function decodeBody(part: Part): string {
  const encoding = (part.headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  const charset = param(part.headers.get('content-type') ?? '', 'charset');
  if (encoding === 'quoted-printable') return decodeQuotedPrintable(part.body, charset);
  if (encoding === 'base64') return bytesToText(Buffer.from(part.body.replace(/\s+/g, ''), 'base64'), charset);
  return part.body;
}

/** Encoded words in headers (RFC 2047): =?charset?B|Q?text?= */
export function decodeHeader(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_all, charset: string, kind: string, text: string) =>
      kind.toUpperCase() === 'B'
        ? bytesToText(Buffer.from(text, 'base64'), charset)
        : decodeQuotedPrintable(text.replace(/_/g, ' '), charset),
    );
}

function findText(part: Part, depth: number): string | undefined {
  const type = part.headers.get('content-type') ?? 'text/plain';
  if (/^multipart\//i.test(type) && depth < 5) {
    const boundary = param(type, 'boundary');
    if (!boundary) return undefined;
    const pieces = part.body.split(`--${boundary}`).slice(1);
    for (const piece of pieces) {
      if (piece.startsWith('--')) break;
      const found = findText(splitPart(piece.replace(/^\n/, '')), depth + 1);
      if (found !== undefined) return found;
    }
    return undefined;
  }
  return /^text\/plain/i.test(type) ? decodeBody(part) : undefined;
}

/** Reads the subject and the plain-text body of a raw RFC 5322 message. */
export function readableMail(raw: string): ReadableMail {
  const top = splitPart(raw);
  return { subject: decodeHeader(top.headers.get('subject') ?? ''), text: (findText(top, 0) ?? '').trim() };
}
