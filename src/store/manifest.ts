import { z } from 'zod';

/** Format tag written into every manifest; a folder whose manifest lacks it is not a Kindred store. */
export const STORE_FORMAT = 'kindred-store';
/**
 * Version of the store layout. Bump it when the layout or any file's meaning changes; old stores are then refused.
 * 5: dimensions la_band_pct and run_speed_ft_s (formerly sweet_spot_pct and sprint_ft_s).
 * 6: group rows carry `outs` (innings pitched in thirds) for pitchers.
 * 7: each group file names its raw and standardised matrices (and its embedding's files) by sha256.
 * 8: players and group rows as columns files (players.bin, group-<G>.rows.bin), read lazily.
 * 9: players.bin also lists every player's rows over windows (`rows_w<N>_*`).
 * 10: coverage partitions may have a narrow index (`group-<G>.p<i>.narrow.hnsw`, src/ann/narrowRows.ts).
 */
export const STORE_FORMAT_VERSION = 10;
/** Name of the manifest inside a store folder (reserved: no data file may use it). */
export const MANIFEST_NAME = 'manifest.json';

/** A data file as the manifest lists it: lowercase hex sha256 of its bytes and its size. */
export const fileEntrySchema = z.strictObject({
  sha256: z.string().regex(/^[0-9a-f]{64}$/, 'expected 64 lowercase hex digits'),
  bytes: z.number().int().nonnegative(),
});

/** The manifest of a store, checked on every open. */
export const manifestSchema = z.strictObject({
  format: z.literal(STORE_FORMAT),
  version: z.literal(STORE_FORMAT_VERSION),
  createdAt: z.iso.datetime(),
  params: z.record(z.string(), z.unknown()),
  files: z.record(z.string(), fileEntrySchema),
});

export type FileEntry = z.infer<typeof fileEntrySchema>;
export type Manifest = z.infer<typeof manifestSchema>;
