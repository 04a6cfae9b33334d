// Just the part of node-postgres that the cluster helper uses (no @types/pg in the project).
declare module 'pg' {
  export interface ClientConfig {
    host?: string;
    port?: number;
    user?: string;
    password?: string;
    database?: string;
    connectionString?: string;
  }
  export class Client {
    constructor(config?: ClientConfig | string);
    connect(): Promise<void>;
    query(
      text: string,
      values?: unknown[],
    ): Promise<{ rows: Record<string, unknown>[]; rowCount: number | null }>;
    end(): Promise<void>;
  }
  const pg: { Client: typeof Client };
  export default pg;
}
