export declare const ROOT: string;
export type Cluster = {
  urls: string[];
  env: Record<string, string>;
  services: { postgres: { stop(): Promise<void>; start(): Promise<void> }; storage: { stop(): Promise<void>; start(): Promise<void> } };
  stop(): Promise<void>;
};
export declare function startCluster(options?: { apps?: number; workers?: number; build?: boolean; quiet?: boolean }): Promise<Cluster>;
