// The OpenAPI document at /api/v1/openapi.json: generated from the request schemas,
// valid OpenAPI 3.1, and listing exactly the route handlers under app/api/v1.
// openapi-responses.test.ts checks the documented answers against real ones.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";
import { beforeAll, describe, expect, it } from "vitest";
import { ZApiTokenInput } from "@/lib/schemas/api-token";
import { ZVesselInput } from "@/lib/schemas/vessel";
import { anonymousClient } from "../fixtures/http";

type TJson = Record<string, unknown>;
type TOperation = {
  operationId: string;
  parameters: { name: string; in: string; required?: boolean; schema: TJson }[];
  requestBody?: { content: Record<string, { schema?: TJson }> };
  responses: Record<string, TJson & { content?: Record<string, { schema?: TJson }> }>;
  security?: Record<string, string[]>[];
};
type TDocument = { openapi: string; info: { title: string; version: string }; paths: Record<string, Record<string, TOperation>>; components: { schemas: Record<string, TJson>; securitySchemes: Record<string, TJson> } };

const API_ROOT = path.join(import.meta.dirname, "../../app/api/v1");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** Every route file under app/api/v1 as "METHOD /api/v1/path/{param}", from its exported handlers. */
function routesOnDisk(dir = API_ROOT, prefix = "/api/v1"): string[] {
  const found: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) found.push(...routesOnDisk(full, `${prefix}/${entry.name.replace(/^\[(\w+)\]$/, "{$1}")}`));
    else if (/^route\.(ts|tsx|js)$/.test(entry.name)) {
      const source = readFileSync(full, "utf8");
      for (const m of METHODS) {
        if (new RegExp(`export\\s+(const|(async\\s+)?function)\\s+${m}\\b`).test(source)) found.push(`${m} ${prefix}`);
      }
    }
  }
  return found;
}

const dropSchemaKey = ({ $schema: _s, ...rest }: TJson) => rest;

function refsIn(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => refsIn(v, out));
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (k === "$ref" && typeof v === "string") out.push(v);
      else refsIn(v, out);
    }
  }
  return out;
}

function resolvePointer(doc: unknown, ref: string): unknown {
  return ref
    .replace(/^#\//, "")
    .split("/")
    .reduce<unknown>((node, part) => (node as TJson | undefined)?.[part.replace(/~1/g, "/").replace(/~0/g, "~")], doc);
}

/** Ajv (JSON Schema 2020-12), a direct dev dependency: the compile check never silently falls away. */
async function loadAjv(): Promise<{ compile: (schema: TJson) => unknown }> {
  const mod = (await import("ajv/dist/2020")) as unknown as { default: new (o: TJson) => { compile: (schema: TJson) => unknown } };
  return new mod.default({ strict: true, validateFormats: false, allowUnionTypes: true });
}

let doc: TDocument;
let schemas: { where: string; schema: TJson }[];

beforeAll(async () => {
  const res = await anonymousClient().request("/api/v1/openapi.json");
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toContain("application/json");
  doc = (await res.json()) as TDocument;
  schemas = [];
  for (const [p, item] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(item)) {
      for (const [type, media] of Object.entries(op.requestBody?.content ?? {})) if (media.schema) schemas.push({ where: `${method} ${p} body ${type}`, schema: media.schema });
      for (const param of op.parameters) schemas.push({ where: `${method} ${p} parameter ${param.name}`, schema: param.schema });
      for (const [status, response] of Object.entries(op.responses)) {
        for (const [type, media] of Object.entries(response.content ?? {})) if (media.schema) schemas.push({ where: `${method} ${p} response ${status} ${type}`, schema: media.schema });
      }
    }
  }
  for (const [name, schema] of Object.entries(doc.components.schemas)) schemas.push({ where: `components.schemas.${name}`, schema });
});

describe("the OpenAPI document", () => {
  it("lists every route handler under app/api/v1, and nothing that does not exist", () => {
    const onDisk = routesOnDisk().sort();
    const documented = Object.entries(doc.paths).flatMap(([p, item]) => Object.keys(item).map((m) => `${m.toUpperCase()} ${p}`)).sort();
    expect(onDisk.length).toBeGreaterThan(40);
    expect(documented.filter((r) => !onDisk.includes(r)), "documented but not in app/api/v1").toEqual([]);
    expect(onDisk.filter((r) => !documented.includes(r)), "in app/api/v1 but missing from lib/http/openapi.ts").toEqual([]);
  });

  it("is OpenAPI 3.1 in its structure", () => {
    expect(doc.openapi).toMatch(/^3\.1\.\d+$/);
    expect(typeof doc.info.title).toBe("string");
    expect(typeof doc.info.version).toBe("string");
    expect(Object.keys(doc.components.securitySchemes).sort()).toEqual(["bearerToken", "sessionCookie"]);
    expect(doc.components.securitySchemes.bearerToken).toMatchObject({ type: "http", scheme: "bearer" });
    const ids = new Set<string>();
    for (const [p, item] of Object.entries(doc.paths)) {
      expect(p).toMatch(/^\/api\/v1(\/|$)/);
      const templated = [...p.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
      for (const [method, op] of Object.entries(item)) {
        expect(["get", "put", "post", "delete", "options", "head", "patch", "trace"]).toContain(method);
        expect(ids.has(op.operationId), `operationId ${op.operationId} is unique`).toBe(false);
        ids.add(op.operationId);
        expect(Object.keys(op.responses).length).toBeGreaterThan(0);
        for (const [status, response] of Object.entries(op.responses)) {
          expect(status).toMatch(/^([1-5]\d\d|[1-5]XX|default)$/);
          expect(typeof response.description).toBe("string");
        }
        const pathParams = op.parameters.filter((x) => x.in === "path");
        expect(pathParams.map((x) => x.name).sort(), `${method} ${p} path parameters`).toEqual([...templated].sort());
        expect(pathParams.every((x) => x.required === true)).toBe(true);
        for (const x of op.parameters) expect(["path", "query", "header", "cookie"]).toContain(x.in);
        for (const requirement of op.security ?? []) for (const scheme of Object.keys(requirement)) expect(doc.components.securitySchemes).toHaveProperty(scheme);
      }
    }
  });

  it("every schema is a JSON Schema object and every $ref resolves", async () => {
    for (const ref of refsIn(doc)) {
      expect(ref, "refs point into this document").toMatch(/^#\//);
      expect(resolvePointer(doc, ref), `${ref} resolves`).toBeTypeOf("object");
    }
    const ajv = await loadAjv();
    for (const { where, schema } of schemas) {
      expect(schema && typeof schema === "object" && !Array.isArray(schema), where).toBe(true);
      // Ajv compiles each schema on its own: the component schemas it refers to come along as $defs.
      const standalone = JSON.parse(JSON.stringify({ ...schema, $defs: doc.components.schemas }).replaceAll("#/components/schemas/", "#/$defs/")) as TJson;
      expect(() => ajv.compile(standalone), where).not.toThrow();
    }
  });

  it("is generated from the zod schemas that validate the requests", () => {
    const body = (p: string, m: string) => doc.paths[p]![m]!.requestBody!.content["application/json"]!.schema;
    const asJsonSchema = (s: z.ZodType) => dropSchemaKey(z.toJSONSchema(s, { target: "draft-2020-12", io: "input", unrepresentable: "any" }) as TJson);
    expect(body("/api/v1/me/tokens", "post")).toEqual(asJsonSchema(ZApiTokenInput));
    expect(body("/api/v1/vessels", "post")).toEqual(asJsonSchema(ZVesselInput));
  });

  it("says which routes take a session or a Bearer token, and which are public", () => {
    expect(doc.paths["/api/v1/vessels"]!.get!.security).toEqual([{ sessionCookie: [] }, { bearerToken: [] }]);
    expect(doc.paths["/api/v1/me/tokens"]!.post!.security).toEqual([{ sessionCookie: [] }]);
    expect(doc.paths["/api/v1/verify"]!.post!.security).toEqual([]);
  });
});
