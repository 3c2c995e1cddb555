// Upload and body limits (policy numbers, one table): the routes enforce
// them while a body streams (app/_lib/body-limit.ts, app/_lib/uploads.ts),
// the pages print them next to the file fields.

/** Largest body a route accepts through route(), and a form post to a page (next.config.mjs says the same for server actions). */
export const MAX_JSON_BODY_BYTES = 256 * 1024;
/** Largest datasheet accepted: vendor datasheets run 0.5–5 MB. */
export const MAX_DATASHEET_BYTES = 10 * 1024 * 1024;
/** Largest parts CSV accepted: 5 000 parts with every column is about 2 MB. */
export const MAX_IMPORT_BYTES = 4 * 1024 * 1024;
/** A bench log of a few hundred readings is a few kB; 1 MB (and 5 000 rows) is generous. */
export const MAX_BENCH_BYTES = 1024 * 1024;
/** Multipart framing around an uploaded file (boundaries, part headers), allowed on top of its limit while the body streams. */
export const MULTIPART_SLACK_BYTES = 64 * 1024;
