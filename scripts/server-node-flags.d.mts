export declare const SERVER_NODE_FLAGS: readonly string[];
