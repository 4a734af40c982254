import type { Knex } from 'knex';

/**
 * Every organization starts with the trade's defect causes, written when the organization is
 * created (a trigger) instead of on the first read of the list: a GET writes nothing. Existing
 * organizations without a list get it now. Each organization may rename, retire or add its own.
 */
const DEFAULTS: [string, string, string][] = [
  ['voids', 'Voids', 'Air pockets or holes under the skin or in the core'],
  ['short_fill', 'Short fill', 'The foam did not fill the cavity'],
  ['skin_defects', 'Skin defects', 'Blisters, pinholes or peeling of the skin'],
  ['splits', 'Splits', 'Cracks or tears, often at demold'],
  ['shrinkage', 'Shrinkage', 'The part shrank or puckered after demold'],
  ['tack', 'Tack', 'Surface still sticky at demold'],
  ['density_off', 'Density off target', 'Molded density outside the tolerance'],
  ['flash', 'Flash', 'Excess foam at the parting line'],
];

export async function up(knex: Knex): Promise<void> {
  const values = DEFAULTS.map(([code, name, description]) => `(${[code, name, description].map((v) => `'${v.replace(/'/g, "''")}'`).join(', ')})`).join(',\n        ');
  await knex.raw(`
    CREATE FUNCTION pourgate_seed_defect_causes() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO defect_causes (organization_id, code, name, description)
      SELECT NEW.id, d.code, d.name, d.description FROM (VALUES
        ${values}
      ) AS d(code, name, description)
      ON CONFLICT (organization_id, code) DO NOTHING;
      RETURN NEW;
    END $$`);
  await knex.raw('CREATE TRIGGER organizations_defect_causes AFTER INSERT ON organizations FOR EACH ROW EXECUTE FUNCTION pourgate_seed_defect_causes()');
  // organizations that never opened the list get it now (one statement: its snapshot sees none of its rows)
  await knex.raw(`
    INSERT INTO defect_causes (organization_id, code, name, description)
    SELECT o.id, d.code, d.name, d.description FROM organizations o CROSS JOIN (VALUES
        ${values}
      ) AS d(code, name, description)
     WHERE NOT EXISTS (SELECT 1 FROM defect_causes c WHERE c.organization_id = o.id)
    ON CONFLICT (organization_id, code) DO NOTHING`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS organizations_defect_causes ON organizations');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_seed_defect_causes()');
}
