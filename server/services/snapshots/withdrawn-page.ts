/** Escapes text for HTML. */
function esc(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * A plain, self-contained HTML page for a share link that is gone or was never there: no scripts
 * and a few lines of inline style, so it needs nothing from the web app.
 */
export function plainLinkPage(status: 404 | 410, reason: 'unknown' | 'revoked' | 'expired'): string {
  const heading = status === 404 ? 'No shared snapshot here' : 'This shared snapshot is no longer available';
  const detail =
    reason === 'revoked'
      ? 'The people who published this comparison have withdrawn the link.'
      : reason === 'expired'
        ? 'This link had an expiry date, and it has passed.'
        : 'There is no shared snapshot at this address. Check the link you were sent.';
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${esc(heading)} · Photon Parity</title>
<style>body{margin:0;font:16px/1.5 system-ui,sans-serif;color:#1d2a30;background:#f6f5f1}main{max-width:40rem;margin:4rem auto;padding:0 1rem}h1{font-size:1.5rem;line-height:1.25}a{color:#1f5a52}</style>
</head>
<body>
<main>
<h1>${esc(heading)}</h1>
<p>${esc(detail)}</p>
<p>If you still need the figures, ask the person who sent you the link for a new one.</p>
<p><a href="/">Photon Parity</a></p>
</main>
</body>
</html>
`;
}
