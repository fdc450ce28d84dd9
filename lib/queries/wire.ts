// The client's view of a server answer: what a value becomes after JSON.stringify and JSON.parse.
// Response types are derived from the server functions through this, never written out by hand.

/** `T` as it arrives over JSON: dates become ISO strings, everything else keeps its shape. */
export type Wire<T> = T extends Date
  ? string
  : T extends readonly (infer U)[]
    ? Wire<U>[]
    : T extends object
      ? { [K in keyof T]: Wire<T[K]> }
      : T;

/** The JSON answer of an async server function. */
export type WireOf<F extends (...args: never[]) => unknown> = Wire<Awaited<ReturnType<F>>>;
