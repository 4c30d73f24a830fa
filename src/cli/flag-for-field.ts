/**
 * The command-line option a core problem belongs to, from the problem's field: the core
 * reports "--rr.lower" for the lower limit of a risk ratio entered with --rr, which the
 * user typed as --ci. Null for fields that are not options (topic paths, arms).
 *
 * @example flagForField('--rrr.upper') // => '--ci'
 */
export function flagForField(field: string): string | null {
  if (!field.startsWith('--')) return null;
  const [flag = field, part] = field.split('.');
  switch (part) {
    case 'lower':
    case 'upper':
    case 'interval':
      return '--ci';
    case 'level':
      return '--level';
    case 'period':
      return '--over/--to';
    case 'baseline':
      return '--baseline';
    default:
      return flag;
  }
}
