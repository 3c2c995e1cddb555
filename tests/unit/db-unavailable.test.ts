import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "@/lib/errors";

// Errors as node-postgres, pg-pool, knex and node's net module raise them
// when PostgreSQL is stopped, restarting or refusing connections. The
// refused-connect and terminated-connection shapes are the ones `npm run
// faults` provokes; the other messages are the drivers' own wording and the
// SQLSTATEs those of the PostgreSQL manual, appendix A "PostgreSQL Error
// Codes", both recalled from memory.
const withCode = (code: string, message = "x") => Object.assign(new Error(message), { code });

describe("isDatabaseUnavailable: 503 for a database that is away, 500 for everything else", () => {
  it.each([
    ["refused connect", withCode("ECONNREFUSED", "connect ECONNREFUSED 127.0.0.1:54339")],
    ["refused connect on every address", Object.assign(new AggregateError([withCode("ECONNREFUSED")], ""), { code: "ECONNREFUSED" })],
    ["aggregate without its own code", new AggregateError([withCode("ECONNREFUSED")], "")],
    ["admin shutdown (57P01)", withCode("57P01", "terminating connection due to administrator command")],
    ["starting up (57P03)", withCode("57P03", "the database system is starting up")],
    ["pool connection ended", new Error("Connection terminated unexpectedly")],
    ["pool connect timeout", new Error("timeout exceeded when trying to connect")],
    ["knex acquire timeout", new Error("Knex: Timeout acquiring a connection. The pool is probably full.")],
    ["wrapped in a cause", new Error("query failed", { cause: withCode("ECONNRESET") })],
  ])("%s", (_what, err) => {
    expect(isDatabaseUnavailable(err)).toBe(true);
  });

  it.each([
    ["unique violation (23505)", withCode("23505", "duplicate key value violates unique constraint")],
    ["syntax error (42601)", withCode("42601", "syntax error at or near")],
    ["a plain bug", new TypeError("Cannot read properties of undefined")],
    ["not an error", "ECONNREFUSED"],
    ["null", null],
  ])("not for %s", (_what, err) => {
    expect(isDatabaseUnavailable(err)).toBe(false);
  });
});
