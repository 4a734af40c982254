import { describe, expect, it } from '@jest/globals';
import Fastify from 'fastify';
import { RouteTable } from './route-table.js';

describe('RouteTable', () => {
  it('names the methods of a known path, and none for a path whose id segment is empty', async () => {
    const app = Fastify();
    const routes = new RouteTable();
    routes.attach(app);
    app.post('/v1/readings/:id/review', async () => ({}));
    app.get('/v1/readings/:id', async () => ({}));
    await app.ready();
    expect(routes.methodsFor('/v1/readings/abc/review')).toEqual(['POST']);
    expect(routes.methodsFor('/v1/readings/abc?x=1')).toEqual(['GET', 'HEAD']);
    expect(routes.methodsFor('/v1/readings//review')).toEqual([]);
    await app.close();
  });
});
