import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireTeam } from '../http/team-context';
import { listFamilies } from '../services/family-service';

export function familyRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/families', async (req, res) => {
    res.json(await listFamilies(ds, requireTeam(req)));
  });
  return r;
}
