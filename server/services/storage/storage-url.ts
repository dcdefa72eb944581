/** Where originals live, read from `STORAGE_URL` and the AWS SDK's usual variables. */
export type StorageConfig =
  /** Files under `UPLOADS_DIR` (the default). */
  | { kind: 'disk' }
  | {
      kind: 's3';
      bucket: string;
      /** Key prefix without leading or trailing slash; '' for the bucket's root. */
      prefix: string;
      /** An S3-compatible server's address; null for AWS itself. */
      endpoint: string | null;
      region: string;
    };

type Env = Record<string, string | undefined>;

// S3's bucket naming rules: 3–63 characters of lower-case letters, digits, dots and hyphens,
// beginning and ending with a letter or digit.
const BUCKET = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;
const SEGMENT = /^[\w.!*'()-]+$/;

const shape = (url: string, why: string) =>
  new Error(`STORAGE_URL must be s3://bucket/prefix (${why}), not "${url}".`);

/**
 * The storage `STORAGE_URL` names: unset or empty is the disk under `UPLOADS_DIR`;
 * `s3://bucket/prefix` is S3-compatible object storage. Throws one line for the operator.
 */
export function storageFrom(env: Env): StorageConfig {
  const url = env.STORAGE_URL?.trim();
  if (!url) return { kind: 'disk' };
  if (!/^s3:\/\//i.test(url)) throw shape(url, 'the only scheme besides the default disk is s3');
  if (/[?#]/.test(url)) throw shape(url, 'no query or fragment');
  const [bucket = '', ...rest] = url.slice('s3://'.length).split('/');
  const rawPrefix = rest.join('/');
  if (bucket.includes('@') || bucket.includes(':'))
    throw shape(url, 'credentials go in AWS_ACCESS_KEY_ID and AWS_SECRET_ACCESS_KEY');
  if (!BUCKET.test(bucket))
    throw shape(url, 'a bucket is 3–63 lower-case letters, digits, dots or hyphens');
  const prefix = rawPrefix.replace(/\/+$/, '');
  const segments = prefix === '' ? [] : prefix.split('/');
  if (segments.some((part) => !SEGMENT.test(part) || part === '.' || part === '..'))
    throw shape(url, 'the prefix is plain names separated by single slashes');
  const endpoint = endpointFrom(env);
  const region = env.AWS_REGION?.trim() || (endpoint ? 'us-east-1' : '');
  if (!region)
    throw new Error('AWS_REGION must be set with an s3:// STORAGE_URL (the bucket’s region).');
  return { kind: 's3', bucket, prefix, endpoint, region };
}

/** `AWS_ENDPOINT_URL_S3`, else `AWS_ENDPOINT_URL`, as the SDK reads them; must be http(s). */
function endpointFrom(env: Env): string | null {
  const name = env.AWS_ENDPOINT_URL_S3 ? 'AWS_ENDPOINT_URL_S3' : 'AWS_ENDPOINT_URL';
  const value = env[name]?.trim();
  if (!value) return null;
  if (!/^https?:\/\/[^/\s?#]+\/?$/.test(value))
    throw new Error(
      `${name} must be an http(s) origin such as http://127.0.0.1:9000, not "${value}".`,
    );
  return value.replace(/\/$/, '');
}
