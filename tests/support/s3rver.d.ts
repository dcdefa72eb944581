/** The parts of @20minutes/s3rver the storage tests use (the package ships no types). */
declare module '@20minutes/s3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    /** Where the server keeps buckets and objects (files on disk). */
    directory: string;
    configureBuckets?: Array<{ name: string }>;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
