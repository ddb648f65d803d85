// The local S3-compatible server (s3rver) on loopback. The app never touches
// its folder: it speaks S3 through @aws-sdk/client-s3, so a real bucket works
// by configuration alone.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

/** Local fake credentials; s3rver accepts only these. Not a secret. */
export const FAKE_ACCESS_KEY_ID = "S3RVER";
export const FAKE_SECRET_ACCESS_KEY = "S3RVER";

export async function startStorageFake({ port, directory, bucket }) {
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    port,
    address: "127.0.0.1",
    directory,
    silent: true,
    configureBuckets: [{ name: bucket }],
  });
  await server.run();
  return { stop: () => server.close() };
}
