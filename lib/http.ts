import "server-only";
import { NextResponse } from "next/server";
import { isKnownError, ValidationError } from "./errors";

/** Wraps a route handler: known errors become their status with a plain message; others a logged 500. */
export function handle<A extends unknown[]>(fn: (...args: A) => Promise<Response>) {
  return async (...args: A): Promise<Response> => {
    try {
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
