/** Latest weighing of `a`, as a join (uses the unique (animal_id, weighed_on) index). */
export const LATEST_WEIGHT_JOIN = `LEFT JOIN weight_record lw ON lw.animal_id = a.id
  AND lw.weighed_on = (SELECT MAX(w.weighed_on) FROM weight_record w WHERE w.animal_id = a.id)`;
