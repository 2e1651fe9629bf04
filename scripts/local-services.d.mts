// Types for local-services.mjs, so TypeScript tests can start the same stand-ins the scripts use.
export declare const S3_DEFAULTS: { bucket: string; accessKeyId: string; secretAccessKey: string }
export declare function startFakeS3(dir: string, port?: number): Promise<{ url: string; close: () => Promise<void> }>
export declare function startMailCapture(outboxFile: string, port?: number): Promise<{ url: string; close: () => Promise<void> }>
export declare function startLocalServices(
  dataDir: string,
  ports?: { s3?: number; smtp?: number },
): Promise<{ env: Record<string, string>; close: () => Promise<unknown> }>
