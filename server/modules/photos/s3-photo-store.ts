import { Readable } from 'node:stream';
import type * as S3Sdk from '@aws-sdk/client-s3';
import type { PhotoStorageConfig } from '../../config';
import type { PhotoStore } from './photo-store';

type S3Config = Extract<PhotoStorageConfig, { kind: 's3' }>;

const missing = (err: unknown) => {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchKey' || e?.name === 'NotFound' || e?.$metadata?.httpStatusCode === 404;
};

/**
 * Photos as objects in an S3 bucket (AWS, or any service speaking its API at `endpoint`). The
 * SDK is loaded on first use, so a server storing photos on disk never loads it.
 */
export function s3PhotoStore(config: S3Config): PhotoStore {
  let loaded: Promise<{ client: S3Sdk.S3Client; sdk: typeof S3Sdk }> | null = null;
  const s3 = () =>
    (loaded ??= import('@aws-sdk/client-s3').then((sdk) => ({
      sdk,
      client: new sdk.S3Client({
        region: config.region,
        endpoint: config.endpoint,
        forcePathStyle: config.forcePathStyle,
        credentials: config.credentials,
      }),
    })));
  const Key = (key: string) => `${config.prefix}${key}`;
  const Bucket = config.bucket;

  return {
    async put(key, body, contentType) {
      const { client, sdk } = await s3();
      await client.send(
        new sdk.PutObjectCommand({ Bucket, Key: Key(key), Body: body, ContentType: contentType }),
      );
    },
    async get(key) {
      const { client, sdk } = await s3();
      try {
        const answer = await client.send(new sdk.GetObjectCommand({ Bucket, Key: Key(key) }));
        const body = answer.Body;
        if (!body) return null;
        return body instanceof Readable
          ? body
          : Readable.from(Buffer.from(await body.transformToByteArray()));
      } catch (err) {
        if (missing(err)) return null;
        throw err;
      }
    },
    async remove(key) {
      const { client, sdk } = await s3();
      await client.send(new sdk.DeleteObjectCommand({ Bucket, Key: Key(key) }));
    },
    close() {
      void loaded?.then(({ client }) => client.destroy());
    },
  };
}
