import "server-only";
import { NextResponse } from "next/server";
import { isKnownError, ValidationError } from "./errors";
import { env } from "./env";
import { guardRequest, type BodyKind } from "./request-guard";

export interface HandleOptions {
  /** What a mutating request may carry: JSON (the default, up to 64 KB), a form (8 KB) or a file upload. */
  body?: BodyKind;
}

const appOrigin = new URL(env.appUrl).origin;

/**
 * Wraps a route handler. A mutating request (POST, PUT, PATCH, DELETE) must come from our own pages
 * (Origin, Sec-Fetch-Site) with a body of the route's kind under its size limit, or it is refused before the
 * handler runs. Known errors become their status with a plain message; others a logged 500.
 */
export function handle<A extends unknown[]>(fn: (...args: A) => Promise<Response>, opts: HandleOptions = {}) {
  return async (...args: A): Promise<Response> => {
    try {
      const req = args[0];
      if (req instanceof Request) {
        const checked = await guardRequest(req, appOrigin, opts.body ?? "json");
        if (checked instanceof Response) return checked;
        (args as unknown[])[0] = checked;
      }
      return await fn(...args);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

export function errorResponse(err: unknown): Response {
  if (isKnownError(err)) {
    const body: Record<string, unknown> = { error: err.message };
    if (err instanceof ValidationError) body.fields = err.fields;
    if ("code" in err) body.code = err.code;
    return NextResponse.json(body, { status: err.status });
  }
  console.error(err);
  return NextResponse.json({ error: "Something went wrong on our side. Nothing was changed." }, { status: 500 });
}

/** Reads a JSON body, refusing anything that is not JSON with a clear message. */
export async function readJson(req: Request): Promise<unknown> {
  try {
    return await req.json();
  } catch {
    throw new ValidationError({ _form: "The request body must be JSON." });
  }
}
