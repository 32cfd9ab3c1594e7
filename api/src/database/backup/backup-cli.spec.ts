import { defaultBackupFolder } from './backup-cli';
import { parseRestoreArguments } from './restore-cli';

describe('backup and restore command lines', () => {
  it('names the default backup folder after the UTC time, under the profile data folder', () => {
    expect(defaultBackupFolder('/srv/.data/dev', new Date('2026-12-04T15:07:06.123Z'))).toBe('/srv/.data/dev/backups/2026-12-04T150706');
    expect(() => defaultBackupFolder(undefined, new Date())).toThrow(/give the backup folder/);
  });

  it('takes one folder and an optional --force, refusing anything else by name', () => {
    expect(parseRestoreArguments(['/b/2026'])).toEqual({ folder: '/b/2026', force: false });
    expect(parseRestoreArguments(['--force', '/b/2026'])).toEqual({ folder: '/b/2026', force: true });
    expect(() => parseRestoreArguments([])).toThrow(/usage: restore FOLDER/);
    expect(() => parseRestoreArguments(['/a', '/b'])).toThrow(/usage: restore FOLDER/);
    expect(() => parseRestoreArguments(['/a', '--forse'])).toThrow('unknown option --forse');
  });
});
