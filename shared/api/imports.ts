/** One file of earlier records being brought in, as the import page shows it. */
export interface ImportJobView {
  id: number;
  groupId: number | null;
  scope: 'group' | 'network';
  fileName: string;
  /** 'ords-0.3', 'ords-0.2' or 'plain'. */
  kind: string;
  status: 'queued' | 'running' | 'done' | 'failed';
  /** Records in the file (rows below the header). */
  total: number;
  imported: number;
  /** Already brought in by an earlier import (same data provider and id). */
  skipped: number;
  /** Rows refused, with the first ones in `errors`. */
  refused: number;
  /** Readable records worked through so far. */
  done: number;
  errors: { row: number; field: string; message: string }[];
  message: string | null;
  createdAt: string;
  finishedAt: string | null;
}

export interface ImportPreview {
  kind: 'ords-0.3' | 'ords-0.2' | 'plain';
  encoding: string;
  delimiter: ',' | ';';
  header: string[];
  rows: string[][];
}
