import type { Knex } from 'knex';
import type { Shop, ShopSettings } from '@/shared/schemas/shop';
import { PRESSURE_UNITS, type PressureUnit } from '@/shared/readings/reading-kinds';
import { createShopRepository, type ShopRow } from '../repositories/shop-repository';
import { notFound } from '../errors';

/** The API shape of a shop row. */
export function toShop(row: ShopRow): Shop {
  const unit = (PRESSURE_UNITS as readonly string[]).includes(row.pressure_unit) ? (row.pressure_unit as PressureUnit) : 'inHg';
  return {
    id: row.id,
    name: row.name,
    altitudeM: row.altitude_m,
    pressureUnit: unit,
    comebackWindowDays: row.comeback_window_days,
  };
}

/** Shop settings: read by all staff, changed by the owner. Always the caller's own shop. */
export function createShopService(knex: Knex) {
  const shops = createShopRepository(knex);
  return {
    async get(shopId: number): Promise<Shop> {
      const row = await shops.findById(shopId);
      if (!row) throw notFound('Your shop');
      return toShop(row);
    },
    async update(shopId: number, settings: ShopSettings): Promise<Shop> {
      await shops.update(shopId, {
        name: settings.name,
        altitude_m: settings.altitudeM,
        pressure_unit: settings.pressureUnit,
        comeback_window_days: settings.comebackWindowDays,
      });
      return this.get(shopId);
    },
  };
}
