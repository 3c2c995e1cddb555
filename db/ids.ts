import crypto from "node:crypto";

// Record ids, one scheme: a readable prefix and 80 random bits in hex
// ("prj_3f9c…"), so an id tells what it names and cannot be guessed. Rows
// listed newest first among equal timestamps (choices, reviews and their
// comments) take a time-ordered id instead: the same prefix, the creation
// time in base 36 (fixed width, so ids sort as times do) and 48 random bits.
export type RecordPrefix = "usr" | "ws" | "inv" | "prj" | "opt" | "prt" | "fil" | "job" | "bnr" | "tok" | "chc" | "rvw" | "rvc";

export function newRecordId(prefix: RecordPrefix): string {
  return `${prefix}_${crypto.randomBytes(10).toString("hex")}`;
}

export function newTimeOrderedId(prefix: RecordPrefix): string {
  return `${prefix}_${Date.now().toString(36).padStart(9, "0")}${crypto.randomBytes(6).toString("hex")}`;
}
