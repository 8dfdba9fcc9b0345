// Large loader data travels as one JSON string. React Router encodes loader data value by value
// (turbo-stream) into the document and again for every revalidation; for a payload of hundreds of
// nested values that costs several times one JSON.stringify, and on the browser JSON.parse reads
// it faster than the equivalent script ("The cost of JavaScript in 2019", V8 blog). The type rides
// along, so both ends stay checked.
export type JsonPayload<T> = string & { readonly __payload: T };

/** What a value becomes after a JSON round trip: dates are strings. */
export type Json<T> = T extends Date
  ? string
  : T extends (infer U)[]
    ? Json<U>[]
    : T extends object
      ? { [K in keyof T]: Json<T[K]> }
      : T;

export const toPayload = <T>(value: T) => JSON.stringify(value) as JsonPayload<T>;

export const fromPayload = <T>(payload: JsonPayload<T>): Json<T> => JSON.parse(payload) as Json<T>;
