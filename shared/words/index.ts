/**
 * Hatchway's vocabulary: the words a person reads for every stored code, once. Screens, PDFs,
 * e-mails and server messages take their words from here; each map is typed
 * `Record<Enum, string>`, so a new enum value fails the type-check until it has words.
 */
export * from "./alerts";
export * from "./animals";
export * from "./compliance";
export * from "./custody";
export * from "./documents";
export * from "./fields";
export * from "./mail";
export * from "./manifest";
export * from "./packing";
export * from "./people";
export * from "./temperature";
export * from "./transfer";
export * from "./changes";
export * from "./evidence";
export * from "./register";
export * from "./runs";
export * from "./offline";
