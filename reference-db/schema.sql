-- GemIndex catalogue schema. The version is PRAGMA user_version (set by the code that runs this file,
-- CatalogueSchema.Version) and repeated in meta('schema_version'). Used for both the shipped catalogue
-- (built from materials/*.json, meta('kind') = 'shipped') and the user's catalogue (meta('kind') = 'user').
-- Enumerations are stored as the lower-case words of the JSON files ('uniaxial', 'very_common').
CREATE TABLE meta (
    key   TEXT PRIMARY KEY,
    value TEXT NOT NULL
) STRICT;

CREATE TABLE material (
    id                INTEGER PRIMARY KEY,
    name              TEXT NOT NULL UNIQUE COLLATE NOCASE,
    species           TEXT NOT NULL,
    variety           TEXT NOT NULL,
    family            TEXT NOT NULL,
    origin            TEXT NOT NULL,
    crystal_system    TEXT NOT NULL,
    optic_character   TEXT NOT NULL,
    optic_sign        TEXT NOT NULL,
    birefringence_min REAL,
    birefringence_max REAL,
    sg_min            REAL NOT NULL,
    sg_max            REAL NOT NULL,
    dispersion        REAL,
    hardness_min      REAL,
    hardness_max      REAL,
    pleochroism       TEXT NOT NULL,
    thermal_probe     TEXT NOT NULL,
    electrical        TEXT NOT NULL,
    frequency         TEXT NOT NULL,  -- the species' frequency at a bench (the prior)
    share             TEXT NOT NULL,  -- how common this variety is among stones of its species
    forms             TEXT NOT NULL,  -- space-separated: 'crystal', 'aggregate', 'amorphous'
    opaque            INTEGER NOT NULL CHECK (opaque IN (0, 1)),
    do_not_immerse    INTEGER NOT NULL CHECK (do_not_immerse IN (0, 1)),
    notes             TEXT NOT NULL,
    stated_fields     TEXT NOT NULL,  -- space-separated field names the variety states instead of inheriting
    sg_usual_min      REAL,           -- the part of the SG range where most stones lie (schema 3; null: the whole range alike)
    sg_usual_max      REAL,
    CHECK (sg_min <= sg_max),
    -- a range's two ends are stated together or not at all
    CHECK ((hardness_min IS NULL) = (hardness_max IS NULL) AND (hardness_min IS NULL OR hardness_min <= hardness_max)),
    CHECK ((birefringence_min IS NULL) = (birefringence_max IS NULL) AND (birefringence_min IS NULL OR birefringence_min <= birefringence_max)),
    CHECK ((sg_usual_min IS NULL) = (sg_usual_max IS NULL)
           AND (sg_usual_min IS NULL OR (sg_min <= sg_usual_min AND sg_usual_min <= sg_usual_max AND sg_usual_max <= sg_max)))
) STRICT;

-- Principal refractive indices at 589.3 nm: 'n' | 'omega','epsilon' | 'alpha','beta','gamma'.
CREATE TABLE material_index (
    material_id INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    axis        TEXT NOT NULL CHECK (axis IN ('n', 'omega', 'epsilon', 'alpha', 'beta', 'gamma')),
    min         REAL NOT NULL,
    max         REAL NOT NULL,
    CHECK (min <= max),
    PRIMARY KEY (material_id, axis)
) STRICT;

CREATE TABLE material_polariscope (
    material_id INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    position    INTEGER NOT NULL,
    reaction    TEXT NOT NULL,
    PRIMARY KEY (material_id, position)
) STRICT;

-- Fluorescence: wave 'long' (365 nm) or 'short' (254 nm).
CREATE TABLE material_uv (
    material_id INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    wave        TEXT NOT NULL CHECK (wave IN ('long', 'short')),
    position    INTEGER NOT NULL,
    strength    TEXT NOT NULL,
    PRIMARY KEY (material_id, wave, position)
) STRICT;

CREATE TABLE material_absorption (
    material_id INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    position    INTEGER NOT NULL,
    nanometres  REAL NOT NULL,
    strength    TEXT NOT NULL CHECK (strength IN ('weak', 'moderate', 'strong')),
    PRIMARY KEY (material_id, position)
) STRICT;

CREATE TABLE material_colour (
    material_id INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    position    INTEGER NOT NULL,
    colour      TEXT NOT NULL,
    PRIMARY KEY (material_id, position)
) STRICT;

-- The references values name: a published work, 'from_memory', 'common_practice' or a 'judgement' from published works, with its citation.
CREATE TABLE reference (
    key      TEXT PRIMARY KEY,
    kind     TEXT NOT NULL CHECK (kind IN ('published', 'from_memory', 'common_practice', 'judgement')),
    citation TEXT NOT NULL
) STRICT;

-- The source of each of an entry's values, by field name as the family files spell it ('omega', 'sg', 'uv_long').
CREATE TABLE material_source (
    material_id   INTEGER NOT NULL REFERENCES material (id) ON DELETE CASCADE,
    field         TEXT NOT NULL,
    reference_key TEXT NOT NULL REFERENCES reference (key),
    PRIMARY KEY (material_id, field)
) STRICT;
