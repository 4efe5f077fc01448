import { renderToStaticMarkup } from 'react-dom/server';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CaughtMessage } from '../../src/features/admin/components/caught-message';
import { splitLinks } from '../../src/features/admin/lib/text-with-links';
import type { TextPart } from '../../src/features/admin/lib/text-with-links';

const joined = (parts: TextPart[]) => parts.map((p) => (p.kind === 'link' ? p.href : p.text)).join('');
const links = (parts: TextPart[]) => parts.flatMap((p) => (p.kind === 'link' ? [p.href] : []));

describe('splitLinks', () => {
  it('finds the sign-in address on a line of its own, as the sign-in mail writes it', () => {
    const url = 'http://127.0.0.1:3000/auth/callback/nodemailer?callbackUrl=%2Fworkspaces&token=ab12&email=pim%40lumen-advice.example';
    const parts = splitLinks(`Hello Pim,\n\nOpen this link to sign in:\n\n${url}\n\nIf you did not ask for it, ignore this message.`);
    expect(links(parts)).toEqual([url]);
  });

  it('leaves the full stop or bracket that closes a sentence out of the address', () => {
    expect(links(splitLinks('See https://example.org/invitations/x1.'))).toEqual(['https://example.org/invitations/x1']);
    expect(links(splitLinks('(at http://localhost:3000/s/abc)'))).toEqual(['http://localhost:3000/s/abc']);
  });

  it('makes links of http and https addresses only', () => {
    expect(links(splitLinks('javascript:alert(1) data:text/html,x ftp://example.org/f mailto:a@b.example'))).toEqual([]);
  });

  it('gives back the text unchanged when the parts are joined, whatever the text', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.string(), fc.webUrl(), fc.constantFrom('.', ')', '\n', ' ', 'https://'))), (pieces) => {
        const text = pieces.join('');
        expect(joined(splitLinks(text))).toBe(text);
      }),
    );
  });
});

describe('CaughtMessage', () => {
  it('shows who the message went to and its text, with the address in it as a working link', () => {
    const html = renderToStaticMarkup(
      <CaughtMessage
        message={{
          id: 7,
          receivedAt: '2024-05-01T09:30:00.000Z',
          from: 'Photon Parity <no-reply@photon-parity.example>',
          to: ['odile.farrant@hollowbrook.example'],
          subject: 'Wren Aldous invites you',
          text: 'Open this link:\n\nhttp://localhost:3000/invitations/tok_1\n\nIgnore it otherwise.',
        }}
      />,
    );
    expect(html).toContain('<h2 id="caught-7"');
    expect(html).toContain('odile.farrant@hollowbrook.example');
    expect(html).toContain('href="http://localhost:3000/invitations/tok_1"');
    expect(html).toContain('Ignore it otherwise.');
  });
});
