import "server-only";
import { AppError, type FieldIssue } from "@/lib/errors";
import { MAX_IMPORT_BYTES, MULTIPART_SLACK_BYTES } from "@/lib/limits";
import { readFormLimited, readTextLimited } from "./body-limit";
import { refuseUnstorableText } from "./request-guards";

// The upload routes' one way of reading a file: the limit holds while the
// body streams (body-limit.ts), then again on the file itself; the file
// name is checked like any other text.

const isMultipart = (req: Request) => (req.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data");

export interface UploadedFile {
  form: FormData;
  file: File;
  bytes: Uint8Array;
}

/** The multipart field "file" (a PDF, a CSV: `what`), at most `maxBytes`. */
export async function readMultipartFile(
  req: Request,
  opts: { maxBytes: number; tooLarge: () => AppError; what: string; missingIssues?: FieldIssue[] },
): Promise<UploadedFile> {
  if (!isMultipart(req)) throw new AppError("unsupported_media_type", `Send the ${opts.what} as the multipart form field "file".`);
  const form = await readFormLimited(req, opts.maxBytes + MULTIPART_SLACK_BYTES, opts.tooLarge);
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", `Attach the ${opts.what} as the form field "file".`, opts.missingIssues);
  if (file.size > opts.maxBytes) throw opts.tooLarge();
  refuseUnstorableText({ file: file.name });
  return { form, file, bytes: new Uint8Array(await file.arrayBuffer()) };
}

const importTooLarge = () => new AppError("payload_too_large", `An import file may be at most ${MAX_IMPORT_BYTES / (1024 * 1024)} MB.`);

/** A parts CSV: the raw body as text/csv, or the `file` field of a multipart form. */
export async function readCsvUpload(req: Request): Promise<string> {
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  let text: string;
  if (isMultipart(req)) {
    const file = (await readFormLimited(req, MAX_IMPORT_BYTES + MULTIPART_SLACK_BYTES, importTooLarge)).get("file");
    if (!(file instanceof Blob)) throw new AppError("bad_request", 'Attach the CSV file as the form field "file".');
    if (file.size > MAX_IMPORT_BYTES) throw importTooLarge();
    text = await file.text();
  } else if (type.startsWith("text/csv") || type.startsWith("text/plain")) {
    text = await readTextLimited(req, MAX_IMPORT_BYTES, importTooLarge);
  } else {
    throw new AppError("unsupported_media_type", 'Send the CSV as text/csv or as a multipart form field "file".');
  }
  if (!text.trim()) throw new AppError("bad_request", "The file is empty.");
  const nul = text.indexOf("\u0000");
  if (nul >= 0) {
    const row = text.slice(0, nul).split("\n").length;
    throw new AppError("bad_request", "The file contains a NUL (U+0000) character; is it really a CSV text file?", [
      { path: `row ${row}`, message: "contains a NUL (U+0000) character" },
    ]);
  }
  return text;
}
