import { splitLinks } from '../lib/text-with-links';

/** A message's plain text as written, line breaks kept, with its web addresses as links. */
export function TextWithLinks({ text }: { text: string }) {
  return (
    <div className="whitespace-pre-wrap break-words font-mono text-sm leading-relaxed">
      {splitLinks(text).map((part, i) =>
        part.kind === 'link' ? (
          <a key={i} href={part.href} className="break-all text-spruce-700 underline underline-offset-2" rel="noreferrer">
            {part.href}
          </a>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </div>
  );
}
