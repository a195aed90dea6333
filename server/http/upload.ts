import multer from 'multer';

/** Largest pattern file accepted (a multi-size pattern as SVG or DXF is rarely above 2 MB). */
export const UPLOAD_LIMIT_BYTES = 5 * 1024 * 1024;
export const UPLOAD_LIMIT_LABEL = '5 MB';

/** JSON bodies that carry a whole pattern (a review's labels, a print): a few MB of path data. */
export const PATTERN_BODY_LIMIT = '8mb';

/**
 * One file in field `file`, kept in memory for the importer and never written to disk or served:
 * only the geometry the importer reads from it is stored.
 */
export const singlePatternFile = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_LIMIT_BYTES, files: 1, fields: 10, fieldSize: 10_000, parts: 12 },
}).single('file');
