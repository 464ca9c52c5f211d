export const NS_WE: string;
export const NS_WETP: string;
export const TABLE_SETTING_KEY: string;
export const PINNED_DATA_KEY: string;
export interface WebExtensionPart {
  part: string;
  addinId: string;
  version: string;
  properties: Map<string, string>;
}
export function webExtensionXml(o: { instanceId: string; addinId: string; version: string; properties: Record<string, string> }): string;
export function writeWebExtension(buffer: Uint8Array | ArrayBuffer, o: { addinId: string; version: string; settings: Record<string, unknown> }): Promise<Buffer>;
export function readWebExtensions(buffer: Uint8Array | ArrayBuffer): Promise<WebExtensionPart[]>;
export function settingValue(raw: string): unknown;
export function readSetting(
  buffer: Uint8Array | ArrayBuffer,
  key: string,
  addinId?: string | null,
): Promise<{ found: false } | { found: true; value: unknown; part: string; addinId: string }>;
export function manifestIdentity(manifestXml: string): { id: string; version: string };
