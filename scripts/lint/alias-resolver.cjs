/**
 * Import resolver for the lint's layering rule: the tsconfig alias "@/x" is the project root, and
 * relative and package imports resolve as node does. (interfaceVersion 2 of eslint-module-utils.)
 */
const fs = require("node:fs");
const path = require("node:path");
const nodeResolver = require("eslint-import-resolver-node");

const root = path.resolve(__dirname, "../..");
const extensions = [".ts", ".tsx", ".mts", ".js", ".mjs", ".cjs", ".json"];

function asFile(base) {
  for (const candidate of [
    base,
    ...extensions.map((e) => base + e),
    ...extensions.map((e) => path.join(base, "index" + e)),
  ]) {
    if (fs.existsSync(candidate) && fs.statSync(candidate).isFile()) return candidate;
  }
  return null;
}

module.exports = {
  interfaceVersion: 2,
  resolve(source, file) {
    if (source.startsWith("@/")) return { found: true, path: asFile(path.join(root, source.slice(2))) };
    if (source.startsWith(".")) {
      const found = asFile(path.resolve(path.dirname(file), source));
      if (found) return { found: true, path: found };
    }
    return nodeResolver.resolve(source, file, {});
  },
};
