// The parts of s3rver 3.7 the fake uses (the package ships no types).
declare module 's3rver' {
  type Options = { port?: number; address?: string; directory: string; silent?: boolean; configureBuckets?: Array<{ name: string; configs: Array<string | Buffer> }> };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
