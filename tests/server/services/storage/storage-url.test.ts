import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../../../server/config';
import { storageFrom } from '../../../../server/services/storage/storage-url';

const base = { SESSION_SECRET: 'x', DATA_DIR: '/tmp/printwarden-config-test' };

describe('STORAGE_URL', () => {
  it('is the disk under UPLOADS_DIR when unset or empty', () => {
    expect(storageFrom({})).toEqual({ kind: 'disk' });
    expect(storageFrom({ STORAGE_URL: '  ' })).toEqual({ kind: 'disk' });
    expect(loadConfig(base).storage).toEqual({ kind: 'disk' });
  });

  it('reads s3://bucket/prefix with the endpoint and region variables', () => {
    expect(
      storageFrom({
        STORAGE_URL: 's3://prints-archive/originals/v1/',
        AWS_ENDPOINT_URL_S3: 'http://127.0.0.1:9000/',
        AWS_ENDPOINT_URL: 'http://elsewhere:1',
        AWS_REGION: 'eu-north-1',
      }),
    ).toEqual({
      kind: 's3',
      bucket: 'prints-archive',
      prefix: 'originals/v1',
      endpoint: 'http://127.0.0.1:9000',
      region: 'eu-north-1',
    });
    expect(
      storageFrom({
        STORAGE_URL: 's3://prints-archive',
        AWS_ENDPOINT_URL: 'https://s3.example.org',
      }),
    ).toEqual({
      kind: 's3',
      bucket: 'prints-archive',
      prefix: '',
      endpoint: 'https://s3.example.org',
      region: 'us-east-1',
    });
    expect(storageFrom({ STORAGE_URL: 's3://b12/x', AWS_REGION: 'us-west-2' })).toMatchObject({
      endpoint: null,
      region: 'us-west-2',
    });
  });

  it('refuses a bad URL at start with one line that says what is wrong', () => {
    const refused: Array<[string, RegExp]> = [
      ['https://bucket/prefix', /only scheme besides the default disk is s3/],
      ['s3://', /a bucket is 3–63/],
      ['s3:///prefix', /a bucket is 3–63/],
      ['s3://Prints/prefix', /a bucket is 3–63/],
      ['s3://-prints', /a bucket is 3–63/],
      ['s3://key:secret@prints/x', /AWS_ACCESS_KEY_ID/],
      ['s3://prints/a//b', /plain names/],
      ['s3://prints/a/../b', /plain names/],
      ['s3://prints/x?versionId=1', /no query or fragment/],
    ];
    for (const [url, why] of refused) {
      const env = { ...base, STORAGE_URL: url, AWS_REGION: 'eu-north-1' };
      expect(() => loadConfig(env), url).toThrow(ConfigError);
      expect(() => loadConfig(env), url).toThrow(why);
    }
  });

  it('refuses a missing region for AWS itself and an endpoint that is not an http(s) origin', () => {
    expect(() => loadConfig({ ...base, STORAGE_URL: 's3://prints' })).toThrow(
      /AWS_REGION must be set/,
    );
    expect(() =>
      loadConfig({ ...base, STORAGE_URL: 's3://prints', AWS_ENDPOINT_URL_S3: '127.0.0.1:9000' }),
    ).toThrow(/AWS_ENDPOINT_URL_S3 must be an http\(s\) origin/);
  });
});
