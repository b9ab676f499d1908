-- Candidate search (src/catalog/candidates.ts): parts of one kind, approval state, lifecycle and
-- currency, cheapest first, with the ratings the hard limits compare. Covering, so a search reads
-- the index alone until it has chosen which parts to evaluate; see docs/ranking.md.
CREATE INDEX part_candidate ON part (kind, approval, lifecycle, currency, unit_price, id,
  vrrm_v, if_av_a, ifsm_a, trr_s, cj_f, vz_v, vrwm_v);
