// The purity rule of app/domain: no framework, database, Node built-in or environment access in its modules.
import { readdirSync, readFileSync } from "node:fs";
import { builtinModules } from "node:module";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const DOMAIN_DIR = fileURLToPath(new URL(".", import.meta.url));

const FORBIDDEN_PACKAGES = ["react", "react-dom", "react-router", "@react-router", "sequelize", "pg", "umzug", "nodemailer", "stripe", "remix-auth"];
const FORBIDDEN_ALIASES = ["#db/", "#app/data", "#app/lib", "#seeds/", "#tests/", "#fixtures/"];

/** Every module of app/domain; tests are left out because they may read files (as this one does). */
function listDomainModules(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) return listDomainModules(path);
    return entry.name.endsWith(".ts") && !entry.name.endsWith(".test.ts") ? [path] : [];
  });
}

/** The specifiers of static imports, re-exports and dynamic imports in a source text. */
function findImportSpecifiers(source: string): string[] {
  const pattern = /(?:import|export)\s[^;]*?from\s*["']([^"']+)["']|import\s*["']([^"']+)["']|import\s*\(\s*["']([^"']+)["']\s*\)|require\s*\(\s*["']([^"']+)["']\s*\)/g;
  return [...source.matchAll(pattern)].map((match) => match[1] ?? match[2] ?? match[3] ?? match[4]);
}

/** Why a specifier breaks the rule, or null when it is allowed. */
function whyForbidden(specifier: string): string | null {
  if (specifier.startsWith("node:") || builtinModules.includes(specifier) || builtinModules.includes(specifier.split("/")[0])) return "Node built-in";
  const root = specifier.startsWith("@") ? specifier.split("/").slice(0, 2).join("/") : specifier.split("/")[0];
  if (FORBIDDEN_PACKAGES.includes(root) || FORBIDDEN_PACKAGES.some((name) => name.startsWith("@") && root === name)) return `framework or service package ${root}`;
  if (specifier.startsWith("@react-router/")) return "framework package";
  if (FORBIDDEN_ALIASES.some((alias) => specifier.startsWith(alias))) return "outside the domain";
  if (/(^|\/)(data|lib|db)(\/|$)/.test(specifier) && specifier.startsWith("..")) return "outside the domain";
  return null;
}

describe("app/domain import rule", () => {
  const modules = listDomainModules(DOMAIN_DIR);

  it("finds the domain modules to scan", () => {
    expect(modules.map((path) => relative(DOMAIN_DIR, path))).toEqual(expect.arrayContaining(["part.ts", "gain-curve.ts", "evaluate-part.ts"]));
  });

  it("imports no framework, database, Node built-in or app/data, app/lib module", () => {
    const offences = modules.flatMap((path) =>
      findImportSpecifiers(readFileSync(path, "utf8")).flatMap((specifier) => {
        const reason = whyForbidden(specifier);
        return reason ? [`${relative(DOMAIN_DIR, path)} imports ${specifier} (${reason})`] : [];
      }),
    );
    expect(offences).toEqual([]);
  });

  it("never reads process.env", () => {
    const offences = modules.filter((path) => /\bprocess\s*\.\s*env\b|\bprocess\s*\[/.test(readFileSync(path, "utf8")));
    expect(offences.map((path) => relative(DOMAIN_DIR, path))).toEqual([]);
  });

  it("recognises the forbidden forms, so the scan cannot pass by missing them", () => {
    const sample = [
      'import { readFileSync } from "node:fs";',
      'import path from "path";',
      'import { useState } from "react";',
      'import type { Route } from "react-router";',
      'import { Model } from "sequelize";',
      'export { x } from "#db/models/part";',
      'const m = await import("#app/lib/env.server");',
      'import "../data/parts.server";',
      'import { z } from "zod";',
      'import { hfeAt } from "./gain-curve";',
    ].join("\n");
    const reasons = findImportSpecifiers(sample).map((specifier) => [specifier, whyForbidden(specifier)]);
    expect(reasons).toEqual([
      ["node:fs", "Node built-in"],
      ["path", "Node built-in"],
      ["react", "framework or service package react"],
      ["react-router", "framework or service package react-router"],
      ["sequelize", "framework or service package sequelize"],
      ["#db/models/part", "outside the domain"],
      ["#app/lib/env.server", "outside the domain"],
      ["../data/parts.server", "outside the domain"],
      ["zod", null],
      ["./gain-curve", null],
    ]);
  });
});
