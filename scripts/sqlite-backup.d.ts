export function backupFileName(now?: Date): string;
export function integrityCheck(file: string): Promise<string>;
export function backupSqlite(source: string, targetDir: string, now?: Date): Promise<string>;
