import { DefaultNamingStrategy, type NamingStrategyInterface } from 'typeorm';

const snake = (s: string): string => s.replace(/([a-z0-9])([A-Z])/g, '$1_$2').replace(/([A-Z])([A-Z][a-z])/g, '$1_$2').toLowerCase();

/**
 * snake_case tables and columns, so hand-written SQL (migrations, NOTIFY
 * triggers, psql sessions) reads naturally. The usual npm package for this
 * pins TypeORM 0.3 as a peer, hence these few lines of our own.
 */
export class SnakeNamingStrategy extends DefaultNamingStrategy implements NamingStrategyInterface {
  override tableName(className: string, customName: string | undefined): string {
    return customName ?? snake(className);
  }
  override columnName(propertyName: string, customName: string | undefined, prefixes: string[]): string {
    return snake(prefixes.concat(customName ?? propertyName).join('_'));
  }
  override relationName(propertyName: string): string {
    return snake(propertyName);
  }
  override joinColumnName(relationName: string, referencedColumnName: string): string {
    return snake(`${relationName}_${referencedColumnName}`);
  }
  override joinTableColumnName(tableName: string, propertyName: string, columnName?: string): string {
    return snake(`${tableName}_${columnName ?? propertyName}`);
  }
}
