import { p } from "@mikro-orm/core";
import { v7 as uuidv7 } from "uuid";

/** Record ids are UUID v7: time-ordered for the index, never guessable sequence numbers. */
export function newId(): string {
  return uuidv7();
}

export const idProperty = () =>
  p
    .uuid()
    .primary()
    .onCreate(() => newId());
export const createdAtProperty = () => p.datetime().onCreate(() => new Date());
