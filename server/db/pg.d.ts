// Just the part of node-postgres that the cluster helper and the pool's client use (no @types/pg
// in the project).
declare module 'pg' {
  import type { EventEmitter } from 'node:events';

  export interface ClientConfig {
    host?: string;
    port?: number;
    user?: string;
    password?: string;
    database?: string;
    connectionString?: string;
  }
  /** A message the server sent: an ErrorResponse's fields, among them its severity. */
  export interface BackendMessage {
    severity?: string;
    code?: string;
  }
  export class Client extends EventEmitter {
    constructor(config?: ClientConfig | string);
    /** The protocol connection: emits 'errorMessage' for each ErrorResponse. */
    readonly connection: EventEmitter;
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
