import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../../server/env';

// A JWT secret so loadConfig does not write one to the data dir.
const base = { TANDEM_JWT_SECRET: 'x'.repeat(32), TANDEM_DATA_DIR: '/tmp/tandem-config-test' };
const s3 = {
  ...base,
  TANDEM_STORAGE: 's3',
  TANDEM_S3_BUCKET: 'shop-files',
  TANDEM_S3_REGION: 'us-east-1',
};

describe('object storage settings in server/env.ts', () => {
  it('when nothing is set, then files stay on local disk (what npm start runs)', () => {
    expect(loadConfig(base).storage).toEqual({ kind: 'local' });
    expect(loadConfig({ ...base, TANDEM_STORAGE: 'local' }).storage).toEqual({ kind: 'local' });
  });

  it('when TANDEM_STORAGE=s3 with every setting, then the S3 store gets bucket, region, endpoint, path style and keys', () => {
    expect(
      loadConfig({
        ...s3,
        TANDEM_S3_ENDPOINT: 'http://objects.internal:9000',
        TANDEM_S3_FORCE_PATH_STYLE: '1',
        TANDEM_S3_ACCESS_KEY_ID: 'tandem-app',
        TANDEM_S3_SECRET_ACCESS_KEY: 'not-a-real-secret',
      }).storage,
    ).toEqual({
      kind: 's3',
      bucket: 'shop-files',
      region: 'us-east-1',
      endpoint: 'http://objects.internal:9000',
      forcePathStyle: true,
      credentials: { accessKeyId: 'tandem-app', secretAccessKey: 'not-a-real-secret' },
    });
  });

  it('when S3 is chosen with no keys and no endpoint, then virtual-hosted style and the SDK credential chain are used', () => {
    expect(loadConfig(s3).storage).toEqual({
      kind: 's3',
      bucket: 'shop-files',
      region: 'us-east-1',
      endpoint: undefined,
      forcePathStyle: false,
      credentials: undefined,
    });
  });

  it('when S3 settings are incomplete or inconsistent, then loading fails and names the setting', () => {
    expect(() => loadConfig({ ...base, TANDEM_STORAGE: 's3' })).toThrow(/TANDEM_STORAGE=s3 needs TANDEM_S3_BUCKET and TANDEM_S3_REGION/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_REGION: undefined })).toThrow(/needs TANDEM_S3_REGION$/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_ACCESS_KEY_ID: 'tandem-app' })).toThrow(
      /TANDEM_S3_ACCESS_KEY_ID and TANDEM_S3_SECRET_ACCESS_KEY go together/,
    );
    expect(() => loadConfig({ ...base, TANDEM_S3_BUCKET: 'shop-files' })).toThrow(/TANDEM_S3_BUCKET set but TANDEM_STORAGE is not "s3"/);
  });

  it('when a value is malformed, then loading fails with the field (bucket naming rules: AWS S3 user guide, "Bucket naming rules")', () => {
    expect(() => loadConfig({ ...s3, TANDEM_STORAGE: 'gcs' })).toThrow(/TANDEM_STORAGE/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_BUCKET: 'Shop_Files' })).toThrow(/TANDEM_S3_BUCKET/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_BUCKET: 'ab' })).toThrow(/TANDEM_S3_BUCKET/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_ENDPOINT: 'objects.internal' })).toThrow(/TANDEM_S3_ENDPOINT/);
    expect(() => loadConfig({ ...s3, TANDEM_S3_FORCE_PATH_STYLE: 'yes' })).toThrow(/TANDEM_S3_FORCE_PATH_STYLE/);
  });
});
