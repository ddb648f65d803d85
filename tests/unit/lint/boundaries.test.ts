// The lint configuration is the only thing that keeps the rooms apart: each boundary is tried here
// with a small made-up module placed where the rule applies, so a loosened rule fails this test.
import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

// The cycle rule follows files on disk, and these made-up modules are not there.
const eslint = new ESLint({ cwd: process.cwd(), overrideConfig: { rules: { "import/no-cycle": "off" } } });

async function rulesBroken(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result!.messages.filter((m) => m.severity === 2).map((m) => m.ruleId ?? m.message);
}

const RESTRICTED = "@typescript-eslint/no-restricted-imports";
const CLIENT = "ohmstead/client-boundary";

// The first case loads the whole lint configuration (the type-aware parser included): seconds on a busy machine.
describe("boundaries between the rooms", { timeout: 60_000 }, () => {
  it.each([
    ["a page reads a model", "app/(app)/example/page.tsx", `import { Project } from "@/models";\nexport const x = Project;\n`, RESTRICTED],
    [
      "a service reads a model",
      "lib/server/services/example.ts",
      `import { Packet } from "@/models/packet";\nexport const x = Packet;\n`,
      RESTRICTED,
    ],
    [
      "pure engineering reaches the server",
      "lib/engineering/example.ts",
      `import { listProjects } from "@/lib/server/data/projects";\nexport const x = listProjects;\n`,
      RESTRICTED,
    ],
    [
      "pure engineering uses node I/O",
      "lib/domain/example.ts",
      `import { readFileSync } from "node:fs";\nexport const x = readFileSync;\n`,
      RESTRICTED,
    ],
    [
      "the layout of the diagram imports fees",
      "lib/sld/example.ts",
      `import { formatUsd } from "@/lib/fees";\nexport const x = formatUsd;\n`,
      RESTRICTED,
    ],
    [
      "a template computes with lib at run time",
      "templates/pdf/example.tsx",
      `import { formatUsd } from "@/lib/fees";\nexport const x = formatUsd;\n`,
      RESTRICTED,
    ],
    [
      "a template reaches the server even for a type",
      "templates/pdf/example.tsx",
      `import type { Viewer } from "@/lib/server/auth";\nexport type X = Viewer;\n`,
      RESTRICTED,
    ],
    [
      "pure engineering takes a type from the data layer",
      "lib/engineering/example.ts",
      `import type { ProjectDto } from "@/lib/server/data/projects";\nexport type X = ProjectDto;\n`,
      RESTRICTED,
    ],
    [
      "a model imports a rule from lib",
      "models/example.ts",
      `import { STAGES } from "@/lib/domain/stages";\nexport const x = STAGES;\n`,
      RESTRICTED,
    ],
    [
      "a shared component imports a route's action",
      "components/example.tsx",
      `import { saveAction } from "@/app/(app)/settings/actions";\nexport const x = saveAction;\n`,
      RESTRICTED,
    ],
    [
      "a client component takes a type from a server module",
      "components/example.tsx",
      `"use client";\nimport type { Viewer } from "@/lib/server/auth";\nexport type X = Viewer;\n`,
      CLIENT,
    ],
    [
      "a client component in a route imports a model",
      "app/(app)/example/_components/x.tsx",
      `"use client";\nimport type { Project } from "@/models/project";\nexport type X = Project;\n`,
      CLIENT,
    ],
    [
      "a client component imports its route's server action",
      "app/(app)/example/_components/x.tsx",
      `"use client";\nimport { saveAction } from "../actions";\nexport const x = saveAction;\n`,
      CLIENT,
    ],
    [
      "a client component imports a share action",
      "app/(app)/example/_components/x.tsx",
      `"use client";\nimport { revokeAction } from "../share-actions";\nexport const x = revokeAction;\n`,
      CLIENT,
    ],
  ])("%s is refused", async (_what, filePath, code, rule) => {
    expect(await rulesBroken(filePath, code)).toContain(rule);
  });

  it.each([
    ["the data layer reads a model", "lib/server/data/example.ts", `import { Project } from "@/models";\nexport const x = Project;\n`],
    [
      "a model takes its column types from the shared module",
      "models/example.ts",
      `import type { Stage } from "@/lib/domain/stored-values";\nexport type X = Stage;\n`,
    ],
    [
      "a template takes a type from pure lib",
      "templates/pdf/example.tsx",
      `import type { FeeLine } from "@/lib/fees";\nexport type X = FeeLine;\n`,
    ],
    [
      "pure engineering imports the domain",
      "lib/engineering/example.ts",
      `import { STAGES } from "@/lib/domain/stages";\nexport const x = STAGES;\n`,
    ],
    [
      "a client component takes a DTO type",
      "components/example.tsx",
      `"use client";\nimport type { ActionResult } from "@/lib/dto/action-result";\nexport type X = ActionResult<number>;\n`,
    ],
    [
      "a client component types its action prop",
      "app/(app)/example/_components/x.tsx",
      `"use client";\nimport type { saveAction } from "../actions";\nexport type X = typeof saveAction;\n`,
    ],
    [
      "a page imports its route's action",
      "app/(app)/example/page.tsx",
      `import { saveAction } from "./actions";\nexport const x = saveAction;\n`,
    ],
  ])("%s is allowed", async (_what, filePath, code) => {
    expect(await rulesBroken(filePath, code)).toEqual([]);
  });
});
