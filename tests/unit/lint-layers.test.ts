// The layer rules in eslint.config.mjs, run through ESLint's own API on probe files placed as if in each folder.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { ESLint, type Linter } from "eslint";
import { beforeAll, describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../..", import.meta.url));
const RULE = "@typescript-eslint/no-restricted-imports";

let eslint: ESLint;
beforeAll(() => {
  eslint = new ESLint({ cwd: root, overrideConfigFile: join(root, "eslint.config.mjs") });
});

async function lint(filePath: string, code: string): Promise<Linter.LintMessage[]> {
  const [result] = await eslint.lintText(code, { filePath: join(root, filePath) });
  return result.messages;
}

const restricted = (messages: Linter.LintMessage[]) => messages.filter((m) => m.ruleId === RULE);

const PURE = ["lib/auth", "lib/bom", "lib/catalog", "lib/commissioning", "lib/compare", "lib/layout", "lib/loop", "lib/resistors", "lib/review", "lib/schedule", "lib/sheet", "lib/sites", "lib/solver"];

describe("layer rules", () => {
  it("a React import in lib/loop is refused", async () => {
    const messages = await lint("lib/loop/__probe__.ts", `import React from "react";\nexport const probe = React;\n`);
    expect(restricted(messages)).toHaveLength(1);
    expect(restricted(messages)[0]).toMatchObject({ severity: 2, line: 1, message: expect.stringContaining("no React or Next") });
  }, 120_000);

  it("a database import in lib/loop is refused", async () => {
    const messages = await lint("lib/loop/__probe__.ts", `import { db } from "@/lib/server/db";\nexport const probe = db;\n`);
    expect(restricted(messages)).toHaveLength(1);
    expect(restricted(messages)[0]).toMatchObject({ severity: 2, message: expect.stringContaining("no lib/server") });
  }, 120_000);

  it("a clean engine file passes with no message at all", async () => {
    const code = `import { analyzeLoop } from "./analyze-loop";\nimport { formatOhms } from "@/lib/resistors/format-ohms";\nimport { z } from "zod";\nexport const probe = [analyzeLoop, formatOhms, z];\n`;
    expect(await lint("lib/loop/__probe__.ts", code)).toEqual([]);
  }, 120_000);

  it.each(PURE)("%s refuses React, Next, the server, the models, the database and Node built-ins", async (folder) => {
    const code = [
      `import { useState } from "react";`,
      `import { redirect } from "next/navigation";`,
      `import { db } from "@/lib/server/db";`,
      `import { User } from "@/models";`,
      `import { Op } from "sequelize";`,
      `import { readFileSync } from "node:fs";`,
      `import { join } from "path";`,
      `export const probe = [useState, redirect, db, User, Op, readFileSync, join];`,
    ].join("\n");
    const lines = restricted(await lint(`${folder}/__probe__.ts`, code)).map((m) => m.line);
    expect(lines).toEqual([1, 2, 3, 4, 5, 6, 7]);
  }, 120_000);

  it("lib/findings.ts is held to the same rules", async () => {
    const messages = await lint("lib/findings.ts", `import { Sequelize } from "sequelize";\nexport const probe = Sequelize;\n`);
    expect(restricted(messages)).toHaveLength(1);
  }, 120_000);

  it("the engine does not load the shipped catalog; its tests and the loader itself may", async () => {
    const code = `import { shippedCatalog } from "@/lib/catalog/shipped";\nexport const probe = shippedCatalog;\n`;
    expect(restricted(await lint("lib/sheet/__probe__.ts", code))).toHaveLength(1);
    expect(restricted(await lint("lib/sheet/__probe__.test.ts", code))).toEqual([]);
    const shipped = readFileSync(join(root, "lib/catalog/shipped.ts"), "utf8");
    expect(restricted(await lint("lib/catalog/shipped.ts", shipped))).toEqual([]);
  }, 120_000);

  it("engine tests may read files but still not reach React or the server", async () => {
    const code = `import { readFileSync } from "node:fs";\nimport { db } from "@/lib/server/db";\nexport const probe = [readFileSync, db];\n`;
    expect(restricted(await lint("lib/loop/__probe__.test.ts", code)).map((m) => m.line)).toEqual([2]);
  }, 120_000);

  it("only lib/server, scripts, migrations and tests import the models", async () => {
    const code = `import { User } from "@/models";\nexport const probe = User;\n`;
    for (const file of ["components/__probe__.tsx", "app/(app)/__probe__/page.tsx", "lib/openapi/__probe__.ts", "bench/__probe__.ts"]) {
      expect(restricted(await lint(file, code)), file).toHaveLength(1);
    }
    expect(restricted(await lint("components/__probe__.tsx", `import { User } from "../models/index";\nexport const probe = User;\n`))).toHaveLength(1);
    for (const file of ["lib/server/__probe__.ts", "scripts/__probe__.ts", "tests/integration/__probe__.ts"]) {
      expect(restricted(await lint(file, code)), file).toEqual([]);
    }
  }, 120_000);

  it("browser hooks may name a server type but not import server code", async () => {
    const typeOnly = `import type { LayoutMeta } from "@/lib/server/layouts";\nexport type Probe = LayoutMeta;\n`;
    expect(restricted(await lint("lib/client/__probe__.ts", typeOnly))).toEqual([]);
    const value = `import { saveLayoutSchema } from "@/lib/server/layouts";\nexport const probe = saveLayoutSchema;\n`;
    expect(restricted(await lint("lib/client/__probe__.ts", value))).toHaveLength(1);
  }, 120_000);
});
