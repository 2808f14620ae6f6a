-- The form of a piece: slab (two heated faces, the size its thickness), strip (the size its width),
-- cube (its edge) or ball (its diameter). The size stays in thickness_mm, read as the shape says.
-- Portable SQL: runs unchanged on H2 2.x and PostgreSQL 10 or later.
--
-- Surfaces saved before shapes existed were planned as slabs. French fries (a potato surface sold as
-- French fries, or with no product, whose usual product is French fries) are strips, and become
-- strips. Everything else stays a slab, roast potatoes included: that product also covers rösti, a
-- flat cake, so a cook sets chunks to "cube" by hand. Saved plans keep their own copy of the inputs
-- and are not changed.
ALTER TABLE surface ADD COLUMN shape VARCHAR(16) DEFAULT 'slab' NOT NULL;

UPDATE surface
SET shape = 'strip'
WHERE category = 'potato' AND (product IS NULL OR product = 'french-fries');
