import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { DeletionImpactDto, DeletionImpactItemDto } from './deletion-impact.dto';

interface Counted {
  key: string;
  one: string;
  many: string;
  effect: DeletionImpactItemDto['effect'];
  /** One COUNT(*) taking the row's id as its only parameter. */
  sql: string;
}

/**
 * Counts what deleting a build, an assembly or a footage takes with it, following the schema's
 * ON DELETE rules (CASCADE: deleted; SET NULL: unlinked). Each count is one indexed COUNT(*), so
 * asking before a delete costs little. Every lookup goes through the workshop: another workshop's id is 404.
 */
@Injectable()
export class DeletionImpactService {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  build(workshopId: string, buildId: string): Promise<DeletionImpactDto> {
    return this.impact('SELECT title AS name FROM builds WHERE id = ? AND workshop_id = ?', 'Build not found', workshopId, buildId, [
      { key: 'assemblies', one: 'assembly', many: 'assemblies', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM assemblies WHERE build_id = ?' },
      {
        key: 'fitChecks',
        one: 'fit check',
        many: 'fit checks',
        effect: 'deleted',
        sql: 'SELECT COUNT(*) AS n FROM fit_checks c JOIN assemblies a ON a.id = c.assembly_id WHERE a.build_id = ?',
      },
      { key: 'footage', one: 'footage', many: 'footage', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM footage WHERE build_id = ?' },
      { key: 'marks', one: 'mark', many: 'marks', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM marks m JOIN footage f ON f.id = m.footage_id WHERE f.build_id = ?' },
      { key: 'guides', one: 'guide', many: 'guides', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM guides WHERE build_id = ?' },
      {
        key: 'publishedGuides',
        one: 'of them published (readers lose it)',
        many: 'of them published (readers lose them)',
        effect: 'deleted',
        sql: 'SELECT COUNT(*) AS n FROM guides WHERE build_id = ? AND published_revision_id IS NOT NULL',
      },
      { key: 'fitReports', one: 'fit report', many: 'fit reports', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM fit_reports WHERE build_id = ?' },
    ]);
  }

  assembly(workshopId: string, assemblyId: string): Promise<DeletionImpactDto> {
    return this.impact('SELECT name FROM assemblies WHERE id = ? AND workshop_id = ?', 'Assembly not found', workshopId, assemblyId, [
      { key: 'interfaces', one: 'interface', many: 'interfaces', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM assembly_interfaces WHERE assembly_id = ?' },
      {
        key: 'measurements',
        one: 'measurement',
        many: 'measurements',
        effect: 'deleted',
        sql: 'SELECT COUNT(*) AS n FROM measurements m JOIN assembly_interfaces i ON i.id = m.interface_id WHERE i.assembly_id = ?',
      },
      { key: 'fitChecks', one: 'fit check', many: 'fit checks', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM fit_checks WHERE assembly_id = ?' },
      {
        key: 'guides',
        one: 'guide loses its checklist and parts list',
        many: 'guides lose their checklist and parts list',
        effect: 'unlinked',
        sql: 'SELECT COUNT(*) AS n FROM guides WHERE assembly_id = ?',
      },
    ]);
  }

  footage(workshopId: string, footageId: string): Promise<DeletionImpactDto> {
    return this.impact('SELECT title AS name FROM footage WHERE id = ? AND workshop_id = ?', 'Footage not found', workshopId, footageId, [
      { key: 'transcripts', one: 'transcript', many: 'transcripts', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM transcripts WHERE footage_id = ?' },
      { key: 'marks', one: 'mark', many: 'marks', effect: 'deleted', sql: 'SELECT COUNT(*) AS n FROM marks WHERE footage_id = ?' },
      { key: 'guides', one: 'guide loses its video', many: 'guides lose their video', effect: 'unlinked', sql: 'SELECT COUNT(*) AS n FROM guides WHERE footage_id = ?' },
      {
        key: 'steps',
        one: 'guide step loses its moment',
        many: 'guide steps lose their moment',
        effect: 'unlinked',
        sql: 'SELECT COUNT(*) AS n FROM guide_steps WHERE footage_id = ?',
      },
      {
        key: 'measurements',
        one: 'measurement loses its moment',
        many: 'measurements lose their moment',
        effect: 'unlinked',
        sql: 'SELECT COUNT(*) AS n FROM measurements WHERE footage_id = ?',
      },
    ]);
  }

  private async impact(nameSql: string, notFound: string, workshopId: string, id: string, counts: Counted[]): Promise<DeletionImpactDto> {
    const [row] = (await this.db.query(nameSql, [id, workshopId])) as { name: string }[];
    if (!row) throw new NotFoundException(notFound);
    const items: DeletionImpactItemDto[] = [];
    for (const counted of counts) {
      const [{ n }] = (await this.db.query(counted.sql, [id])) as { n: string | number }[];
      const count = Number(n);
      if (count > 0) items.push({ key: counted.key, count, effect: counted.effect, text: `${count} ${count === 1 ? counted.one : counted.many}` });
    }
    return { name: row.name, items };
  }
}
