import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { efficiencyRules } from '../../../shared/rules/efficiency';
import { electricalRules } from '../../../shared/rules/electrical';
import { refrigerantRules } from '../../../shared/rules/refrigerant';
import { regulationRules } from '../../../shared/rules/regulation';

const families = { refrigerant: refrigerantRules, regulation: regulationRules, electrical: electricalRules, efficiency: efficiencyRules };

describe('reference rule families', () => {
  it.each(Object.entries(families))('when the %s folder is listed, then each file is one rule named by its id', (family, rules) => {
    const dir = join(__dirname, '../../../shared/rules', family);
    const files = readdirSync(dir).filter((f) => f.endsWith('.ts') && f !== 'index.ts').map((f) => f.replace(/\.ts$/, '')).sort();
    expect(rules.map((r) => r.id.slice(family.length + 1)).sort()).toEqual(files);
    expect(rules.every((r) => r.family === family)).toBe(true);
  });
});
