/** Words for a rule's family and its citation, as shown beside findings. */

/** A rule family (the first part of a rule's id) as a heading word for "Not checked". */
export function familyWords(family: string): string {
  const words: Record<string, string> = {
    airflow: 'Airflow',
    capacity: 'Capacity',
    coil: 'Coil',
    condensate: 'Condensate',
    controls: 'Controls',
    efficiency: 'Efficiency',
    electrical: 'Electrical',
    fit: 'Fit',
    lineset: 'Line set',
    metering: 'Metering device',
    rating: 'Certified rating',
    refrigerant: 'Refrigerant',
    regulation: 'Refrigerant regulations',
  };
  return words[family] ?? family.charAt(0).toUpperCase() + family.slice(1);
}

/** A citation as shown: provenance notes such as "(from memory)" stay in the code, not on screen. */
export function citationWords(citation: string): string {
  return citation
    .replace(/\s*\(from memory\)/gi, '')
    .replace(/\s*—\s*from memory/gi, '')
    .replace(/\s{2,}/g, ' ')
    .trim();
}
