import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from '@20minutes/s3rver';

export interface LocalS3 {
  /** `http://127.0.0.1:PORT`, for `AWS_ENDPOINT_URL_S3`. */
  endpoint: string;
  /** Stops the server (once; later calls do nothing) and removes its files. */
  close: () => Promise<void>;
}

/** s3rver's fixed credentials (any other key is refused with 403). */
export const LOCAL_S3_KEY = 'S3RVER';

/**
 * A local S3-compatible server (s3rver) on loopback with one empty bucket, and the AWS SDK's
 * credential variables pointed at it. The bucket is made by the server at start:
 * s3rver 4 signs bucket-level paths without the trailing slash the SDK sends, so the
 * SDK's CreateBucket is refused (object operations are not affected).
 */
export async function startLocalS3(bucket: string): Promise<LocalS3> {
  const directory = mkdtempSync(join(tmpdir(), 'printwarden-s3-'));
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket }],
  });
  const { port } = await server.run();
  // API files share one process (isolate: false): the variables go back as they were.
  const before = {
    id: process.env.AWS_ACCESS_KEY_ID,
    secret: process.env.AWS_SECRET_ACCESS_KEY,
    quiet: process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED,
  };
  process.env.AWS_ACCESS_KEY_ID = LOCAL_S3_KEY;
  process.env.AWS_SECRET_ACCESS_KEY = LOCAL_S3_KEY;
  // The SDK's notice that its 2027 releases need Node 22 (see DEVELOPERS.md) once is enough.
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
  let closed = false;
  return {
    endpoint: `http://127.0.0.1:${port}`,
    close: async () => {
      if (closed) return;
      closed = true;
      await server.close();
      restore('AWS_ACCESS_KEY_ID', before.id);
      restore('AWS_SECRET_ACCESS_KEY', before.secret);
      restore('AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED', before.quiet);
      rmSync(directory, { recursive: true, force: true });
    },
  };
}

function restore(name: string, value: string | undefined): void {
  if (value === undefined) delete process.env[name];
  else process.env[name] = value;
}
