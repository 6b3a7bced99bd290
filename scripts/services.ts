/**
 * Local stand-ins for hosted services, on loopback only:
 *  - an SMTP catcher (smtp-server) that keeps every message, readable as JSON over HTTP
 *    (GET /messages, GET /messages?to=addr, DELETE /messages) and as a plain page at /;
 *  - an S3-compatible object store (s3rver) with the uploads bucket created.
 * The app reaches them through nodemailer and @aws-sdk/client-s3, so a hosted service is configuration only.
 */
import { createServer } from "node:http";
import { mkdirSync } from "node:fs";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import S3rver from "s3rver";

function arg(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : fallback;
}

interface Caught {
  id: number;
  date: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

const smtpPort = Number(arg("smtp", "54325"));
const httpPort = Number(arg("mail-http", "54326"));
const s3Port = Number(arg("s3", "54327"));
const dir = arg("dir", ".data/services");
const bucket = process.env.S3_BUCKET ?? "benchwright-uploads";
const caught: Caught[] = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((m) => {
        const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
        caught.push({ id: nextId++, date: new Date().toISOString(), from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "", to, subject: m.subject ?? "", text: m.text ?? "", html: typeof m.html === "string" ? m.html : "" });
        if (caught.length > 500) caught.shift();
        callback();
      })
      .catch((e: Error) => callback(e));
  },
});
smtp.listen(smtpPort, "127.0.0.1");

const esc = (s: string) => s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c] as string);

createServer((req, res) => {
  const url = new URL(req.url ?? "/", `http://127.0.0.1:${httpPort}`);
  if (url.pathname === "/messages" && req.method === "DELETE") {
    caught.length = 0;
    res.writeHead(204).end();
    return;
  }
  const to = url.searchParams.get("to")?.toLowerCase();
  const list = to ? caught.filter((m) => m.to.includes(to)) : caught;
  if (url.pathname === "/messages") {
    res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify(list));
    return;
  }
  const rows = [...list].reverse().map((m) => `<article><h2>${esc(m.subject)}</h2><p>${esc(m.date)} to ${esc(m.to.join(", "))}</p><pre>${esc(m.text)}</pre></article>`).join("<hr>");
  res.writeHead(200, { "content-type": "text/html; charset=utf-8" }).end(`<!doctype html><title>Caught mail</title><h1>Caught mail (${list.length})</h1>${rows}`);
}).listen(httpPort, "127.0.0.1");

mkdirSync(dir, { recursive: true });
new S3rver({ port: s3Port, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: bucket, configs: [] }] })
  .run()
  .then(() => console.log(`services: smtp 127.0.0.1:${smtpPort}, caught mail http://127.0.0.1:${httpPort}, s3 http://127.0.0.1:${s3Port}`))
  .catch((e: unknown) => {
    console.error("s3 fake failed to start", e);
    process.exit(1);
  });

const stop = () => process.exit(0);
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
