import { createContext, useContext } from "react";

// The response's script nonce, given by the server entry; empty in the browser, which never needs it.
export const NonceContext = createContext("");

export function useNonce(): string {
  return useContext(NonceContext);
}
