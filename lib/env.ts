import "server-only";
import { parseEnv, refusalMessage, type Env } from "./env-schema";

export class ConfigurationError extends Error {
  constructor(readonly problems: string[]) {
    super(refusalMessage(problems));
    this.name = "ConfigurationError";
  }
}

function load(): Env {
  const result = parseEnv(process.env);
  if (!result.ok) throw new ConfigurationError(result.problems);
  return result.env;
}

/** Settings read once from the environment and validated (see lib/env-schema.ts); unsafe production settings throw. */
export const env: Env = load();
