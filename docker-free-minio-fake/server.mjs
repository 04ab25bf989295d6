// The local S3-compatible store for laptops and tests: s3rver on 127.0.0.1,
// its files in an ignored folder, one bucket with the CORS rule that lets the
// browser upload straight to it. Settings come from the environment (see README.md).
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";
import { presignedSignatureCheck } from "./presigned-check.mjs";

const port = Number(process.env.S3_FAKE_PORT ?? 4569);
const directory = process.env.S3_FAKE_DIR;
const bucket = process.env.S3_BUCKET ?? "tankwright";
const origins = (process.env.S3_FAKE_CORS_ORIGINS ?? "*").split(",").map((o) => o.trim()).filter(Boolean);
if (!directory) {
  console.error("S3_FAKE_DIR is required: the folder that keeps the stored objects");
  process.exit(1);
}
mkdirSync(directory, { recursive: true });

const cors = `<CORSConfiguration>
  <CORSRule>
${origins.map((o) => `    <AllowedOrigin>${o}</AllowedOrigin>`).join("\n")}
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

const server = new S3rver({
  address: "127.0.0.1",
  port,
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [cors] }],
});
// Before s3rver's own middleware: refuse presigned URLs whose signature does not match.
server.middleware.unshift(presignedSignatureCheck({ S3RVER: "S3RVER" }));
await server.run();
console.log(`local S3 store on http://127.0.0.1:${port}, bucket ${bucket}, files in ${directory}`);
const stop = () => server.close().then(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
