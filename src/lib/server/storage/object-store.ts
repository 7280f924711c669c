import {
	DeleteObjectCommand,
	GetObjectCommand,
	NoSuchKey,
	PutObjectCommand,
	S3Client
} from '@aws-sdk/client-s3';
import { building } from '$app/environment';
import { env } from '$env/dynamic/private';

// Any S3-compatible service by configuration; in development and tests the local stand-in that
// `npm start` / `npm test` run on loopback. Fail fast, as the database client does: uploads have nowhere
// to go without a bucket. The build analyses routes without one.
if (!env.S3_BUCKET && !building)
	throw new Error('S3_BUCKET is not set: bill attachments need an S3-compatible bucket (see DEVELOPERS.md).');

const bucket = env.S3_BUCKET ?? 'build-time-placeholder';
const endpoint = env.S3_ENDPOINT || undefined;

const client = new S3Client({
	region: env.S3_REGION || 'us-east-1',
	endpoint,
	// Self-hosted and stand-in stores answer on one host name, with the bucket in the path.
	forcePathStyle: Boolean(endpoint),
	// Without keys the SDK's own chain applies (instance role, shared profile).
	credentials:
		env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
			? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
			: undefined,
	// Checksums only where the protocol demands them: many S3-compatible services (and the stand-in)
	// do not know the newer flexible-checksum headers the SDK sends by default.
	requestChecksumCalculation: 'WHEN_REQUIRED',
	responseChecksumValidation: 'WHEN_REQUIRED'
});

export type StoredObject = { body: ReadableStream<Uint8Array>; bytes: number };

export async function putObject(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
	await client.send(
		new PutObjectCommand({
			Bucket: bucket,
			Key: key,
			Body: bytes,
			ContentType: contentType,
			ContentLength: bytes.byteLength
		})
	);
}

/** The object as a stream and its length, or null when the store has no such key. */
export async function getObject(key: string): Promise<StoredObject | null> {
	try {
		const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
		if (!out.Body) return null;
		return {
			body: out.Body.transformToWebStream() as ReadableStream<Uint8Array>,
			bytes: out.ContentLength ?? 0
		};
	} catch (error) {
		if (error instanceof NoSuchKey) return null;
		throw error;
	}
}

/** Removes the object; removing a key that is not there is not an error (S3's own rule). */
export async function deleteObject(key: string): Promise<void> {
	await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}
