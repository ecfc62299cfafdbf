/** Search (POST and GET) and multi-search (without federation). */
import { Router } from 'express';
import { isJsonObject, type JsonObject } from '../field-paths';
import { assertValidIndexUid } from '../index-catalog';
import { badRequest, MeiliError, toMeiliError } from '../meili-error';
import { queryBoolean, queryInteger, queryList, queryString } from '../request-values';
import { runSearch } from '../search-engine';
import { readSearchRequest } from '../search-request';
import type { StandinState } from '../standin-state';

/** The SDK's searchGet sends arrays comma-joined and numbers as text. */
function searchBodyFromQuery(query: Record<string, unknown>): JsonObject {
  const body: JsonObject = {};
  const q = queryString(query.q);
  if (q !== undefined) body.q = q;
  const filter = queryString(query.filter);
  if (filter !== undefined) body.filter = filter;
  for (const name of ['sort', 'facets', 'attributesToRetrieve', 'attributesToHighlight', 'attributesToCrop', 'attributesToSearchOn']) {
    const list = queryList(query[name]);
    if (list) body[name] = list;
  }
  for (const name of ['limit', 'offset', 'page', 'hitsPerPage']) {
    if (query[name] !== undefined) body[name] = queryInteger(query[name], `search${name[0]?.toUpperCase()}${name.slice(1)}`, 0);
  }
  const showRankingScore = queryBoolean(query.showRankingScore);
  if (showRankingScore !== undefined) body.showRankingScore = showRankingScore;
  for (const name of ['matchingStrategy', 'highlightPreTag', 'highlightPostTag', 'distinct']) {
    const value = queryString(query[name]);
    if (value !== undefined) body[name] = value;
  }
  return body;
}

export function searchRoutes({ catalog }: StandinState): Router {
  const router = Router();

  router.post('/indexes/:uid/search', (req, res) => {
    const index = catalog.get(assertValidIndexUid(req.params.uid));
    res.json(runSearch(index, readSearchRequest(req.body)));
  });

  router.get('/indexes/:uid/search', (req, res) => {
    const index = catalog.get(assertValidIndexUid(req.params.uid));
    res.json(runSearch(index, readSearchRequest(searchBodyFromQuery(req.query))));
  });

  router.post('/multi-search', (req, res) => {
    const body: unknown = req.body;
    if (!isJsonObject(body) || !Array.isArray(body.queries)) throw badRequest('missing_queries', 'Missing field `queries`');
    if (body.federation !== undefined && body.federation !== null) {
      throw badRequest('invalid_multi_search_federated', 'Federated multi-search is not supported by the search stand-in.');
    }
    const results = body.queries.map((query: unknown, position: number) => {
      try {
        if (!isJsonObject(query)) throw badRequest('bad_request', 'Invalid value type: expected an object.');
        const { indexUid, ...params } = query;
        if (indexUid === undefined) throw badRequest('missing_index_uid', 'Missing field `indexUid`');
        const uid = assertValidIndexUid(indexUid);
        return { indexUid: uid, ...runSearch(catalog.get(uid), readSearchRequest(params)) };
      } catch (error) {
        // Meilisearch fails the whole request and says which query was at fault.
        const meiliError = toMeiliError(error);
        throw new MeiliError(
          meiliError.status,
          meiliError.code,
          `Inside \`.queries[${position}]\`: ${meiliError.message}`,
          meiliError.type,
        );
      }
    });
    res.json({ results });
  });

  return router;
}
