-- What a surface is sold as (French fries, crisps, wheat bread ...): it decides the EU acrylamide
-- benchmark. Empty means the category's usual product.
ALTER TABLE surface ADD COLUMN product VARCHAR(32);
