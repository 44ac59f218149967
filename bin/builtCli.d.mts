export declare const CLI_OUT_DIR: string;
export declare const STAMP_FILE: string;
export declare function sourceFingerprint(root: string): string;
export declare function builtCli(root: string): { main: string; worker: string } | undefined;
