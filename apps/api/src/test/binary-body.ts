/** A supertest parser that collects a binary response body (supertest buffers text only): `.buffer(true).parse(binaryBody)`. */
export const binaryBody = (res: import("superagent").Response, cb: (err: Error | null, body: unknown) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on("data", (c: Buffer) => chunks.push(c));
  stream.on("end", () => cb(null, Buffer.concat(chunks)));
};
