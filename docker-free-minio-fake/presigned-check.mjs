// s3rver checks a presigned URL's expiry but not its AWS Signature Version 4,
// so a URL could be reused for another key or another length. Real S3 refuses
// both; this middleware makes the local store refuse them too, by computing the
// query-string signature as S3 does and comparing it with the one given.
import { createHash, createHmac, timingSafeEqual } from "node:crypto";

const encode = (s) => encodeURIComponent(s).replace(/[!'()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
const hmac = (key, text) => createHmac("sha256", key).update(text, "utf8").digest();

function expectedSignature({ method, path, query, headers, secret }) {
  const signedHeaders = query["X-Amz-SignedHeaders"].split(";");
  const canonicalQuery = Object.keys(query)
    .filter((k) => k !== "X-Amz-Signature")
    .sort()
    .map((k) => `${encode(k)}=${encode(String(query[k]))}`)
    .join("&");
  const canonicalHeaders = signedHeaders.map((h) => `${h}:${String(headers[h] ?? "").trim().replace(/\s+/g, " ")}\n`).join("");
  const canonicalRequest = [method, path, canonicalQuery, canonicalHeaders, signedHeaders.join(";"), "UNSIGNED-PAYLOAD"].join("\n");
  const [, date, region, service] = query["X-Amz-Credential"].split("/");
  const scope = `${date}/${region}/${service}/aws4_request`;
  const stringToSign = ["AWS4-HMAC-SHA256", query["X-Amz-Date"], scope, createHash("sha256").update(canonicalRequest).digest("hex")].join("\n");
  const key = hmac(hmac(hmac(hmac(`AWS4${secret}`, date), region), service), "aws4_request");
  return createHmac("sha256", key).update(stringToSign).digest("hex");
}

/** Koa middleware: a presigned (query-string) SigV4 request whose signature does not match is answered 403. */
export function presignedSignatureCheck(secrets) {
  return async (ctx, next) => {
    const q = ctx.query;
    if (q["X-Amz-Algorithm"] === "AWS4-HMAC-SHA256" && q["X-Amz-Signature"] && q["X-Amz-Credential"] && q["X-Amz-SignedHeaders"]) {
      const secret = secrets[q["X-Amz-Credential"].split("/")[0]];
      const given = Buffer.from(String(q["X-Amz-Signature"]));
      const want = secret ? Buffer.from(expectedSignature({ method: ctx.method === "OPTIONS" ? ctx.get("Access-Control-Request-Method") : ctx.method, path: ctx.path, query: q, headers: ctx.headers, secret })) : Buffer.alloc(0);
      if (ctx.method !== "OPTIONS" && (given.length !== want.length || !timingSafeEqual(given, want))) {
        ctx.status = 403;
        ctx.type = "application/xml";
        ctx.body = '<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>SignatureDoesNotMatch</Code><Message>The request signature we calculated does not match the signature you provided.</Message></Error>';
        return;
      }
    }
    await next();
  };
}
