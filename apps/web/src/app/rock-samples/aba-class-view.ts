/** How an ABA screening class appears: an icon and words, never colour alone. */
export interface AbaClassView {
  label: string;
  short: string;
  icon: string;
  tone: 'danger' | 'warning' | 'success';
  colour: string;
}

/** The view of each screening class. */
export const ABA_CLASS_VIEWS: Readonly<Record<string, AbaClassView>> = {
  'potentially-acid-generating': { label: 'potentially acid generating', short: 'PAG', icon: 'dangerous', tone: 'danger', colour: '#a23e2a' },
  uncertain: { label: 'uncertain', short: 'uncertain', icon: 'help', tone: 'warning', colour: '#7a4f00' },
  'non-acid-generating': { label: 'non-acid generating', short: 'NAG', icon: 'check_circle', tone: 'success', colour: '#4f6b4f' },
};

/**
 * The view of a class from the API or libs/chem.
 *
 * @param classification an `AbaClass`
 */
export function abaClassView(classification: string): AbaClassView {
  return ABA_CLASS_VIEWS[classification] ?? ABA_CLASS_VIEWS['uncertain'];
}
