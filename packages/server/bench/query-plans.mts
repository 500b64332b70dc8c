import { socketPath } from '../../../infra/mariadb.ts';
import { run } from '../../../infra/process.ts';

export interface ExplainedTable {
  table: string;
  type: string;
  key: string;
  rows: number;
  extra: string;
}

export interface ExplainedQuery {
  sql: string;
  tables: ExplainedTable[];
  /**
   * Tables read whole (`ALL`), or by every entry of an index (`index` over a tenth of the rows or
   * more), rather than by lookups or by an ordered index walk that stops at the page's end.
   */
  scans: string[];
}

/**
 * The statements the server really sent for a request, read from MariaDB's general log (switched
 * on as root over the private socket only while the request runs), each with its EXPLAIN.
 */
export class QueryPlans {
  private readonly socket: string;

  constructor(
    mariadbDir: string,
    private readonly database: string,
  ) {
    this.socket = socketPath(mariadbDir);
  }

  private async root(sql: string): Promise<string[][]> {
    const output = await run('mariadb', ['--no-defaults', `--socket=${this.socket}`, '-uroot', '-B', '-e', sql]);
    return output
      .split('\n')
      .filter((line) => line.length > 0)
      .map((line) => line.split('\t'));
  }

  /** Runs `request` with the general log on and explains every SELECT it sent that reads the plans. */
  async explain(tableRows: number, request: () => Promise<void>): Promise<ExplainedQuery[]> {
    await this.root("SET GLOBAL log_output = 'TABLE'; TRUNCATE mysql.general_log; SET GLOBAL general_log = 1");
    try {
      await request();
    } finally {
      await this.root('SET GLOBAL general_log = 0');
    }
    const [, ...logged] = await this.root(
      "SELECT REPLACE(REPLACE(CONVERT(argument USING utf8mb4), '\\n', ' '), '\\t', ' ') FROM mysql.general_log " +
        "WHERE command_type = 'Query' AND CONVERT(argument USING utf8mb4) LIKE 'SELECT%`plans`%' ORDER BY event_time",
    );
    const explained: ExplainedQuery[] = [];
    for (const [sql] of logged) {
      const [header, ...rows] = await this.root(`USE \`${this.database}\`; EXPLAIN ${sql!}`);
      const column = (name: string) => header!.indexOf(name);
      const tables = rows.map((row) => ({
        table: row[column('table')] ?? '',
        type: row[column('type')] ?? '',
        key: row[column('key')] ?? '',
        // A row filter adds its share: "1493 (29%)".
        rows: Number.parseInt(row[column('rows')] ?? '0', 10) || 0,
        extra: row[column('Extra')] ?? '',
      }));
      explained.push({
        sql: sql!,
        tables,
        scans: tables
          .filter((table) => table.type === 'ALL' || (table.type === 'index' && table.rows >= tableRows / 10))
          .map(
            (table) =>
              `${table.table} (${table.type}${table.key !== 'NULL' ? ` ${table.key}` : ''}, ${table.rows} rows)`,
          ),
      });
    }
    return explained;
  }
}
