import { CreateDateColumn, UpdateDateColumn } from 'typeorm';

/** Every timestamp is timestamptz; esbuild emits no decorator metadata, so types are always explicit. */
export const CreatedAt = () => CreateDateColumn({ name: 'created_at', type: 'timestamptz' });
export const UpdatedAt = () => UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' });
