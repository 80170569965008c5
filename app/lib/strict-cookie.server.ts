// Signed cookies read strictly: the value must be exactly the text this server wrote. React Router's check
// accepts other spellings of the same signature (base64 padding), which must not count as another token.
import type { Cookie } from "react-router";

function rawValuesOf(header: string | null, name: string): string[] {
  if (!header) return [];
  return header
    .split(";")
    .map((part) => part.trim())
    .filter((part) => part.startsWith(`${name}=`))
    .map((part) => part.slice(name.length + 1));
}

/** The string a signed cookie carries, or null when absent, unsigned, sent twice or spelled unlike our own. */
export async function readStrictCookie(cookie: Cookie, request: Request): Promise<string | null> {
  const header = request.headers.get("Cookie");
  const raw = rawValuesOf(header, cookie.name);
  if (raw.length !== 1) return null;
  const value: unknown = await cookie.parse(`${cookie.name}=${raw[0]}`);
  if (typeof value !== "string" || value.length === 0) return null;
  const written = (await cookie.serialize(value)).split(";")[0]!.slice(cookie.name.length + 1);
  return written === raw[0] ? value : null;
}
