import "server-only";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids come from URLs; a malformed one is treated like any other row the viewer cannot see, before it reaches PostgreSQL's uuid parser. */
export const isUuid = (id: string) => UUID.test(id);
