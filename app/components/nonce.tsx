import { createContext, useContext } from "react";

// The CSP nonce of this response: set on the server render, empty in the browser
// (browsers hide nonce attributes from scripts, so there is nothing to match).
const NonceContext = createContext("");
export const NonceProvider = NonceContext.Provider;
export const useNonce = () => useContext(NonceContext);
