declare module 's3rver' {
  type Options = {
    port?: number;
    address?: string;
    directory: string;
    silent?: boolean;
    resetOnClose?: boolean;
    configureBuckets?: Array<{ name: string; configs: Array<string | Buffer> }>;
  };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
