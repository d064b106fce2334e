// The part of autocannon's API the load bench uses (the package ships no types).
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  export interface AutocannonRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
    setupRequest?: (req: AutocannonRequest, context: Record<string, unknown>) => AutocannonRequest | undefined;
    onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void;
  }

  export interface AutocannonClient extends EventEmitter {
    setRequests(requests: AutocannonRequest[]): void;
  }

  export interface AutocannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    timeout?: number;
    headers?: Record<string, string>;
    requests?: AutocannonRequest[];
    setupClient?: (client: AutocannonClient) => void;
  }

  export interface AutocannonResult {
    requests: { total: number; average: number };
    errors: number;
    timeouts: number;
    non2xx: number;
    duration: number;
  }

  export interface AutocannonInstance extends EventEmitter, PromiseLike<AutocannonResult> {
    stop(): void;
  }

  export default function autocannon(options: AutocannonOptions): AutocannonInstance;
}
