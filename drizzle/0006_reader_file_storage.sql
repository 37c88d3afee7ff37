-- Custom migration: reader files are stored as they were uploaded (xlsx is already zip-compressed),
-- so PostgreSQL need not try to compress them again on every insert (about 4 ms per upload).
-- EXTERNAL: kept out of line in TOAST, never compressed. drizzle-kit does not model storage, so
-- this is not undone by later generated migrations.
ALTER TABLE "reader_files" ALTER COLUMN "content" SET STORAGE EXTERNAL;
