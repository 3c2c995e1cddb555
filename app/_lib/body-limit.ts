import "server-only";
import { AppError } from "@/lib/errors";

// Every request body is read through here: counted while it streams in, and
// refused (413) as soon as it passes its limit, before more of it is held in
// memory. A Content-Length over the limit is refused before reading at all;
// a chunked body without one is refused at the chunk that crosses the limit.
// The rest is not read: the server answers at once, and Node discards what
// the client still sends.

export async function readBodyBytes(req: Request, limit: number, tooLarge: () => AppError): Promise<Uint8Array> {
  const declared = req.headers.get("content-length");
  if (declared !== null && Number(declared) > limit) throw tooLarge();
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      reader.releaseLock();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks, size);
}

export async function readTextLimited(req: Request, limit: number, tooLarge: () => AppError): Promise<string> {
  return new TextDecoder().decode(await readBodyBytes(req, limit, tooLarge));
}

/** A multipart or urlencoded form, parsed from at most `limit` bytes; a malformed one is a 400. */
export async function readFormLimited(req: Request, limit: number, tooLarge: () => AppError): Promise<FormData> {
  const bytes = await readBodyBytes(req, limit, tooLarge);
  try {
    return await new Response(bytes as Uint8Array<ArrayBuffer>, { headers: { "content-type": req.headers.get("content-type") ?? "" } }).formData();
  } catch {
    throw new AppError("bad_request", "The form data could not be read; send a well-formed multipart/form-data body.");
  }
}
