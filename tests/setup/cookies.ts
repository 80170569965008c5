// Reading and forging cookies the way an attacker with a browser's developer tools would.

/** name → value of every Set-Cookie in a response (the last one wins). */
export function setCookiesOf(response: { headers: Record<string, unknown> }): Map<string, string> {
  const raw = ([] as string[]).concat((response.headers["set-cookie"] as string[] | string | undefined) ?? []);
  const cookies = new Map<string, string>();
  for (const line of raw) {
    const match = /^([^=;\s]+)=([^;]*)/.exec(line);
    if (match) cookies.set(match[1]!, match[2]!);
  }
  return cookies;
}

/** The raw Set-Cookie lines of a response. */
export function setCookieLines(response: { headers: Record<string, unknown> }): string[] {
  return ([] as string[]).concat((response.headers["set-cookie"] as string[] | string | undefined) ?? []);
}

export function cookieHeader(cookies: Record<string, string>): string {
  return Object.entries(cookies)
    .map(([name, value]) => `${name}=${value}`)
    .join("; ");
}
