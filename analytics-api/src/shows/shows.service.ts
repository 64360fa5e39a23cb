import type { DataSource } from 'typeorm';
import type { ShowDetail, Show as ShowDto, ShowResult as ShowResultDto } from '@shared/contracts/shows';
import { toCsv } from '@shared/csv/to-csv';
import { Club } from '../db/entities/club.entity';
import { Show } from '../db/entities/show.entity';
import { ShowResult } from '../db/entities/show-result.entity';
import { AppError, notFound } from '../http/app-error';
import { isDuplicateKey } from '../animals/animal-dto';
import { computedAgeClass } from './computed-age-class';
import { parseAwards } from './parse-awards';
import { showCounts } from './show-counts';

interface ShowInput { name?: string; showDate?: string; location?: string | null; hostClub?: string | null; judges?: string[]; sanctionNo?: string | null }
interface SeasonFilter { exhibitor?: string; breed?: string; from?: string; to?: string; page: number; pageSize: number }

/**
 * Results with what the age-class check needs: the matched animal's birth date and its breed's
 * class scheme (else the scheme of the breed the result names).
 */
const RESULT_SQL = `SELECT sr.id, sr.show_id, s.name AS show_name, s.show_date, sr.animal_id, sr.ear_id, sr.exhibitor, sr.breed,
    sr.variety, sr.sex, sr.age_class, sr.entries_in_class, sr.exhibitors_in_class, sr.placing, sr.awards, sr.judge,
    a.birth_date, COALESCE(ab.class_scheme, rb.class_scheme) AS class_scheme
  FROM show_result sr JOIN \`show\` s ON s.id = sr.show_id
  LEFT JOIN animal a ON a.id = sr.animal_id LEFT JOIN breed ab ON ab.id = a.breed_id LEFT JOIN breed rb ON rb.name = sr.breed`;
const RESULT_ORDER = 'ORDER BY s.show_date, s.id, sr.breed, sr.variety, sr.sex, sr.age_class, sr.placing, sr.id';

const RESULT_CSV = [
  { header: 'Show', value: (r: ShowResultDto) => r.showName },
  { header: 'Date', value: (r: ShowResultDto) => r.showDate },
  { header: 'Ear ID', value: (r: ShowResultDto) => r.earId },
  { header: 'Exhibitor', value: (r: ShowResultDto) => r.exhibitor },
  { header: 'Breed', value: (r: ShowResultDto) => r.breed },
  { header: 'Variety', value: (r: ShowResultDto) => r.variety },
  { header: 'Sex', value: (r: ShowResultDto) => r.sex },
  { header: 'Age class', value: (r: ShowResultDto) => r.ageClass },
  { header: 'Entries in class', value: (r: ShowResultDto) => r.entriesInClass },
  { header: 'Exhibitors in class', value: (r: ShowResultDto) => r.exhibitorsInClass },
  { header: 'Placing', value: (r: ShowResultDto) => r.placing },
  { header: 'Awards', value: (r: ShowResultDto) => r.awards.join(' ') },
  { header: 'Judge', value: (r: ShowResultDto) => r.judge },
  { header: 'Age class by birth date', value: (r: ShowResultDto) => r.computedAgeClass },
];

function toResultDto(r: Record<string, unknown>): ShowResultDto {
  const matched = r.animal_id !== null;
  const computed = matched ? computedAgeClass(r.birth_date as string | null, r.show_date as string, r.class_scheme as 'four-class' | 'six-class' | null) : null;
  return {
    id: r.id as number, showId: r.show_id as number, showName: r.show_name as string, showDate: r.show_date as string,
    earId: r.ear_id as string | null, exhibitor: r.exhibitor as string, breed: r.breed as string, variety: r.variety as string | null,
    sex: r.sex as ShowResultDto['sex'], ageClass: r.age_class as ShowResultDto['ageClass'], entriesInClass: r.entries_in_class as number,
    exhibitorsInClass: r.exhibitors_in_class as number, placing: r.placing as number, awards: parseAwards(r.awards as string),
    judge: r.judge as string | null, matched, computedAgeClass: computed, ageClassMismatch: computed !== null && computed !== r.age_class,
  };
}

export class ShowsService {
  constructor(private readonly db: DataSource) {}

  async list(clubId: number, onlyShowId?: number): Promise<ShowDto[]> {
    const rows: Record<string, unknown>[] = await this.db.query(
      `SELECT s.*, (SELECT COUNT(*) FROM show_result r WHERE r.show_id = s.id) AS results
         FROM \`show\` s WHERE s.club_id = ? ${onlyShowId ? 'AND s.id = ?' : ''} ORDER BY s.show_date DESC, s.id DESC`,
      onlyShowId ? [clubId, onlyShowId] : [clubId]);
    return rows.map((s) => ({
      id: s.id as number, name: s.name as string, showDate: s.show_date as string, location: s.location as string | null,
      hostClub: s.host_club as string | null, judges: typeof s.judges === 'string' ? JSON.parse(s.judges) : (s.judges as string[]),
      sanctionNo: s.sanction_no as string | null, results: Number(s.results),
    }));
  }

  async create(clubId: number, input: Required<Pick<ShowInput, 'name' | 'showDate' | 'judges'>> & ShowInput): Promise<ShowDto> {
    if (await this.db.getRepository(Show).existsBy({ clubId, name: input.name, showDate: input.showDate })) throw this.taken(input.name, input.showDate);
    try {
      const saved = await this.db.getRepository(Show).save({
        clubId, name: input.name, showDate: input.showDate, location: input.location ?? null, hostClub: input.hostClub ?? null,
        judges: input.judges, sanctionNo: input.sanctionNo ?? null,
      });
      return this.read(clubId, saved.id);
    } catch (e) {
      if (isDuplicateKey(e)) throw this.taken(input.name, input.showDate);
      throw e;
    }
  }

  async update(clubId: number, showId: number, input: ShowInput): Promise<ShowDto> {
    const show = await this.mustFind(clubId, showId);
    const patch = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    try {
      if (Object.keys(patch).length) await this.db.getRepository(Show).update({ id: showId }, patch);
    } catch (e) {
      if (isDuplicateKey(e)) throw this.taken(input.name ?? show.name, input.showDate ?? show.showDate);
      throw e;
    }
    return this.read(clubId, showId);
  }

  /** A show with results goes only when asked to take its results with it. */
  async remove(clubId: number, showId: number, withResults: boolean): Promise<void> {
    const show = await this.mustFind(clubId, showId);
    const results = await this.db.getRepository(ShowResult).countBy({ showId });
    if (results > 0 && !withResults) {
      throw new AppError('conflict', `${show.name} has ${results} result${results === 1 ? '' : 's'}; delete with ?withResults=true to remove them with the show`, 409, { results });
    }
    await this.db.transaction(async (tx) => {
      await tx.getRepository(ShowResult).delete({ showId });
      await tx.getRepository(Show).delete({ id: showId });
    });
  }

  /** One show with its counts and judges, from its results. */
  async one(clubId: number, showId: number): Promise<ShowDetail> {
    const show = await this.read(clubId, showId);
    return { ...show, ...showCounts(await this.results(clubId, showId), show.judges) };
  }

  async results(clubId: number, showId: number): Promise<ShowResultDto[]> {
    await this.mustFind(clubId, showId);
    const rows = await this.db.query(`${RESULT_SQL} WHERE s.club_id = ? AND sr.show_id = ? ${RESULT_ORDER}`, [clubId, showId]);
    return rows.map(toResultDto);
  }

  async resultsCsv(clubId: number, showId: number): Promise<{ fileName: string; csv: string }> {
    const show = await this.mustFind(clubId, showId);
    const slug = show.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'show';
    return { fileName: `${slug}-${show.showDate}-results.csv`, csv: toCsv(await this.results(clubId, showId), RESULT_CSV) };
  }

  /** The club's published results in a date range (the club's season unless given), filtered. */
  async season(clubId: number, f: SeasonFilter, paged = true) {
    const club = await this.db.getRepository(Club).findOneBy({ id: clubId });
    if (!club) throw notFound('Club');
    const from = f.from ?? club.seasonStart;
    const to = f.to ?? club.seasonEnd;
    const where = ['s.club_id = ?'];
    const params: unknown[] = [clubId];
    if (from) { where.push('s.show_date >= ?'); params.push(from); }
    if (to) { where.push('s.show_date <= ?'); params.push(to); }
    if (f.exhibitor) { where.push('sr.exhibitor = ?'); params.push(f.exhibitor); }
    if (f.breed) { where.push('sr.breed = ?'); params.push(f.breed); }
    const filter = where.join(' AND ');
    const page = paged ? ' LIMIT ? OFFSET ?' : '';
    const [rows, [{ n }]] = await Promise.all([
      this.db.query(`${RESULT_SQL} WHERE ${filter} ${RESULT_ORDER}${page}`, paged ? [...params, f.pageSize, (f.page - 1) * f.pageSize] : params),
      this.db.query(`SELECT COUNT(*) AS n FROM show_result sr JOIN \`show\` s ON s.id = sr.show_id WHERE ${filter}`, params),
    ]);
    return { rows: rows.map(toResultDto) as ShowResultDto[], total: Number(n), page: f.page, pageSize: f.pageSize, from, to };
  }

  async seasonCsv(clubId: number, f: SeasonFilter): Promise<string> {
    return toCsv((await this.season(clubId, f, false)).rows, RESULT_CSV);
  }

  async removeResult(clubId: number, showId: number, resultId: number): Promise<void> {
    await this.mustFind(clubId, showId);
    const r = await this.db.getRepository(ShowResult).delete({ id: resultId, showId });
    if (!r.affected) throw notFound('Result');
  }

  private async read(clubId: number, showId: number): Promise<ShowDto> {
    const [show] = await this.list(clubId, showId);
    if (!show) throw notFound('Show');
    return show;
  }

  private async mustFind(clubId: number, showId: number): Promise<Show> {
    const show = await this.db.getRepository(Show).findOneBy({ id: showId, clubId });
    if (!show) throw notFound('Show');
    return show;
  }

  private taken(name: string, date: string) {
    return new AppError('conflict', `The club already has a show named ${name} on ${date}`, 409, { name: 'Taken on this date' });
  }
}
