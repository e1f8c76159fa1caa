import http from 'node:http';
import mysql from 'mysql2/promise';

/**
 * The HTTP check HAProxy asks of each Galera node: 200 while the node is Synced (wsrep_local_state 4) and ready,
 * 503 otherwise (joining, donor, cut off from the others, or down). On real machines run it beside each node
 * (`node --import tsx server/scripts/cluster/node-check.ts` with CHECK_PORT and CHECK_DATABASE_URL), or any check
 * that answers the same way.
 */
export async function nodeState(url: string): Promise<{ synced: boolean; state: string }> {
  let conn: mysql.Connection | null = null;
  try {
    conn = await mysql.createConnection({ uri: url, connectTimeout: 1000 });
    const [rows] = (await conn.query(
      "SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_state', 'wsrep_ready')",
    )) as unknown as [{ Variable_name: string; Value: string }[]];
    const v = Object.fromEntries(rows.map((r) => [r.Variable_name, r.Value]));
    return { synced: v.wsrep_local_state === '4' && v.wsrep_ready === 'ON', state: v.wsrep_local_state ?? '?' };
  } catch (err) {
    return { synced: false, state: (err as { code?: string }).code ?? 'unreachable' };
  } finally {
    await conn?.end().catch(() => {});
  }
}

export function startNodeCheck(port: number, url: string): Promise<http.Server> {
  const server = http.createServer((_req, res) => {
    void nodeState(url).then(({ synced, state }) => {
      res.writeHead(synced ? 200 : 503, { 'content-type': 'text/plain' });
      res.end(`${synced ? 'synced' : 'not synced'} (wsrep_local_state ${state})\n`);
    });
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve(server));
  });
}

if (process.argv[1] && import.meta.filename === process.argv[1]) {
  const port = Number(process.env.CHECK_PORT ?? 9200);
  await startNodeCheck(port, process.env.CHECK_DATABASE_URL ?? '');
  console.log(`Galera node check on 127.0.0.1:${port}`);
}
