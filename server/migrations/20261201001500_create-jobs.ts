import type { Knex } from 'knex';

/** Jobs: one vehicle visit (repair order, customer, vehicle, mileage, notes). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('jobs', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.string('ro_number', 40).notNullable();
    t.string('customer_name', 120).notNullable();
    t.string('vin', 17).nullable();
    // Kept when the tech accepts a VIN whose check digit fails (pre-1981 or non-North-American).
    t.boolean('vin_override').notNullable().defaultTo(false);
    t.smallint('vehicle_year').unsigned().nullable();
    t.string('make', 60).nullable();
    t.string('model', 60).nullable();
    t.string('engine', 80).nullable();
    t.integer('mileage').unsigned().nullable();
    t.text('notes').nullable();
    t.integer('created_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['shop_id', 'ro_number'], { indexName: 'jobs_shop_ro_unique' });
    t.index(['shop_id', 'vin']);
    t.index(['shop_id', 'customer_name']);
    t.index(['shop_id', 'updated_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('jobs');
}
