import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { render, templateDir } from '../../server/scripts/cluster/templates';

const read = (name: string) => readFileSync(path.join(templateDir, name), 'utf8');
const placeholders = (t: string) => [...new Set([...t.matchAll(/\$\{([A-Z0-9_]+)\}/g)].map((m) => m[1]))];
const fill = (t: string) => Object.fromEntries(placeholders(t).map((k) => [k, `v_${k.toLowerCase()}`]));

describe('the cluster configuration templates (deploy/cluster)', () => {
  it('renders every placeholder and refuses to leave one unfilled', () => {
    const t = read('galera.cnf');
    expect(render(t, fill(t))).not.toMatch(/\$\{/);
    const { SQL_PORT: _dropped, ...rest } = fill(t);
    expect(() => render(t, rest)).toThrow(/SQL_PORT/);
  });

  it('sets what Galera needs on every node', () => {
    // Required settings from the MariaDB Galera Cluster documentation ("Mandatory options"; from memory):
    // row-based binary log, interleaved auto-increment locks, InnoDB, the wsrep provider and cluster address.
    const cnf = render(read('galera.cnf'), fill(read('galera.cnf')));
    expect(cnf).toMatch(/^binlog-format = ROW$/m);
    expect(cnf).toMatch(/^innodb-autoinc-lock-mode = 2$/m);
    expect(cnf).toMatch(/^default-storage-engine = InnoDB$/m);
    expect(cnf).toMatch(/^wsrep-on = ON$/m);
    expect(cnf).toMatch(/^wsrep-provider = \/usr\/lib\/galera\/libgalera_smm\.so$/m);
    expect(cnf).toMatch(/^wsrep-cluster-address = gcomm:\/\//m);
    expect(cnf).toMatch(/gcs\.fc_limit=/);
  });

  it('gives HAProxy one writing node with two backups, and a valid configuration', () => {
    const t = read('haproxy.cfg');
    const dir = mkdtempSync(path.join(os.tmpdir(), 'mendery-haproxy-'));
    const values = {
      ...fill(t),
      RUN_DIR: dir,
      DB_BIND: '127.0.0.1:1',
      APP_BIND: '127.0.0.1:2',
      ERROR_FILE_503: path.join(templateDir, 'unavailable.http'),
      NODE1_SQL: '127.0.0.1:3',
      NODE2_SQL: '127.0.0.1:4',
      NODE3_SQL: '127.0.0.1:5',
      NODE1_CHECK_PORT: 6,
      NODE2_CHECK_PORT: 7,
      NODE3_CHECK_PORT: 8,
      APP1: '127.0.0.1:9',
      APP2: '127.0.0.1:10',
    };
    const cfg = render(t, values);
    const galera = cfg.split('listen galera')[1].split('listen app')[0];
    expect(galera.match(/^\s+server .* backup$/gm)).toHaveLength(2);
    expect(galera.match(/^\s+server /gm)).toHaveLength(3);
    const file = path.join(dir, 'haproxy.cfg');
    writeFileSync(file, cfg);
    // HAProxy's own configuration check (Debian's haproxy, which .ci/run installs).
    const r = spawnSync('haproxy', ['-c', '-q', '-f', file], { encoding: 'utf8' });
    expect(r.error, 'haproxy is not installed').toBeUndefined();
    expect(`${r.stdout}${r.stderr}`.trim()).toBe('');
    expect(r.status).toBe(0);
  });

  it('answers a failed request with 503 and Retry-After, never a bare 502', () => {
    const raw = readFileSync(path.join(templateDir, 'unavailable.http'), 'latin1');
    expect(raw.split('\r\n')[0]).toBe('HTTP/1.0 503 Service Unavailable');
    expect(raw).toMatch(/\r\nRetry-After: \d+\r\n/);
    const body = JSON.parse(raw.split('\r\n\r\n')[1]);
    expect(body.error.code).toBe('unavailable');
  });
});
