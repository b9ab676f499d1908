-- Marks the file as a Headroom catalog (0x4864526D, "HdRm") so other SQLite files are told apart.
PRAGMA application_id = 1214534253;

-- Parts and their ratings. Every number is in SI base units (volts, amperes, seconds,
-- farads, coulombs, watts, ohms, kelvin, K/W); column names carry the unit.
CREATE TABLE part (
  id INTEGER PRIMARY KEY,
  manufacturer TEXT NOT NULL,
  part_number TEXT NOT NULL,
  kind TEXT NOT NULL,
  package TEXT NOT NULL,
  description TEXT NOT NULL DEFAULT '',
  lifecycle TEXT NOT NULL DEFAULT 'active',
  unit_price REAL,
  currency TEXT,
  datasheet_url TEXT,
  notes TEXT,
  vrrm_v REAL,
  if_av_a REAL,
  if_av_ref_k REAL,
  if_av_ref TEXT,
  ifsm_a REAL,
  ifsm_pulse_s REAL,
  -- Lists of test points as JSON arrays: [{"vfV":..,"ifA":..,"tjK":..}], [{"irA":..,"vrV":..,"tjK":..}]
  vf_points TEXT NOT NULL DEFAULT '[]',
  ir_points TEXT NOT NULL DEFAULT '[]',
  cj_f REAL,
  cj_vr_v REAL,
  trr_s REAL,
  qrr_c REAL,
  tj_max_k REAL,
  rth_ja_k_per_w REAL,
  rth_jl_k_per_w REAL,
  rth_jc_k_per_w REAL,
  pd_w REAL,
  vz_v REAL,
  vz_tol REAL,
  izt_a REAL,
  zzt_ohm REAL,
  vz_tempco_per_k REAL,
  vrwm_v REAL,
  vbr_min_v REAL,
  vbr_max_v REAL,
  vbr_it_a REAL,
  vc_v REAL,
  ipp_a REAL,
  pppm_w REAL,
  pppm_rise_s REAL,
  pppm_decay_s REAL,
  updated_at TEXT NOT NULL
);

-- A part is known by its maker and part number, whatever their letter case.
CREATE UNIQUE INDEX part_identity ON part (manufacturer COLLATE NOCASE, part_number COLLATE NOCASE);
CREATE INDEX part_number_lookup ON part (part_number COLLATE NOCASE);
