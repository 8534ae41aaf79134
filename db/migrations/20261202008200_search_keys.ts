import type { Knex } from "knex";

/**
 * Search keys kept beside the rows people search (catalog items, customers), so a search is one
 * LIKE over a stored column instead of folding every row on every keystroke (a 10,000-item
 * catalog: about 1 s folded per query, a few ms stored).
 *
 * hubface_search_key() is the SQL twin of searchKey() in lib/platform/search/normalize.ts: same steps,
 * same letter table. tests/integration/search-key.test.ts runs both over the same texts, so a
 * change to one without the other (and a migration re-creating this function) fails there.
 * Core PostgreSQL only (normalize() is in 13+): no extension to install. knex reads ? as a
 * placeholder, so the look-aheads are written (\?= and (\?! here.
 */
const FUNCTION = String.raw`
create function hubface_search_key(t text) returns text
language sql immutable strict parallel safe
as $$
  select btrim(
    regexp_replace(regexp_replace(regexp_replace(regexp_replace(
      replace(replace(replace(replace(replace(replace(replace(replace(
        translate(
          lower(regexp_replace(normalize(t, NFD), '[\u0300-\u036f\u1ab0-\u1aff\u1dc0-\u1dff\u20d0-\u20ff\ufe20-\ufe2f]', '', 'g')),
          'ŁłØøĐđÐðĦħıĿŀŦŧĸς×',
          'llooddddhhillttkσx'),
        'ß', 'ss'), 'ẞ', 'ss'), 'Æ', 'ae'), 'æ', 'ae'), 'Œ', 'oe'), 'œ', 'oe'), 'Þ', 'th'), 'þ', 'th'),
      '([0-9])[\t\n\v\f\r \u00a0\u2000-\u200a\u2028\u2029\u202f\u205f\u3000]*x[\t\n\v\f\r \u00a0\u2000-\u200a\u2028\u2029\u202f\u205f\u3000]*(\?=[0-9])', '\1x', 'g'),
      '(\.[0-9]*[1-9])0+(\?![0-9])', '\1', 'g'),
      '([0-9])\.0+(\?![0-9])', '\1', 'g'),
      '[\t\n\v\f\r \u00a0\u2000-\u200a\u2028\u2029\u202f\u205f\u3000]+', ' ', 'g'),
    ' ')
$$`;

/** Fields joined by a unit separator (U+001F), which no typed search holds, so no match spans two fields. */
const CATALOG_KEY = `coalesce(hubface_search_key(sku), '') || chr(31) || coalesce(hubface_search_key(description), '') || chr(31) || coalesce(hubface_search_key(tire_size), '') || chr(31) || coalesce(hubface_search_key(bolt_pattern), '')`;
/** A customer is found by name or by the part of the e-mail address before the @. */
const CUSTOMER_KEY = `coalesce(hubface_search_key(name), '') || chr(31) || coalesce(hubface_search_key(split_part(email, '@', 1)), '')`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(FUNCTION);
  await knex.raw(`alter table catalog_items add column search_key text generated always as (${CATALOG_KEY}) stored`);
  await knex.raw(`alter table customers add column search_key text generated always as (${CUSTOMER_KEY}) stored`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table customers drop column search_key");
  await knex.raw("alter table catalog_items drop column search_key");
  await knex.raw("drop function hubface_search_key(text)");
}
