/** Small pieces of SQL the queries share. */

/** A search text as a LIKE pattern's literal part: its %, _ and \ match only themselves. */
export const escapeLike = (text: string) => text.replace(/[%_\\]/g, "\\$&");
