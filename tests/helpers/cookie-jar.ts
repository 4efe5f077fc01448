/** The cookies one browser would keep for one site: enough for sessions, CSRF and sign-in links. */
export class CookieJar {
  private readonly cookies = new Map<string, string>();

  /** Takes in every Set-Cookie of a response; an expired or emptied cookie is dropped. */
  store(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair = '', ...attributes] = line.split(';');
      const eq = pair.indexOf('=');
      if (eq <= 0) continue;
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attributes.some((a) => {
        const [k = '', v = ''] = a.split('=');
        const key = k.trim().toLowerCase();
        return (key === 'max-age' && Number(v) <= 0) || (key === 'expires' && new Date(v).getTime() < Date.now());
      });
      if (expired || value === '') this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  /** The Cookie header to send, or undefined when the jar is empty. */
  header(): string | undefined {
    if (this.cookies.size === 0) return undefined;
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  has(name: string): boolean {
    return this.cookies.has(name);
  }

  get(name: string): string | undefined {
    return this.cookies.get(name);
  }

  set(name: string, value: string): void {
    this.cookies.set(name, value);
  }

  clear(): void {
    this.cookies.clear();
  }
}
