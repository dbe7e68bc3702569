import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface StoredComment {
  id: number;
  issue: number;
  body: string;
  user: string;
}

export interface StoredPull {
  number: number;
  state: string;
  headSha: string;
  /** "owner:branch", for GET /pulls?head=. */
  head: string;
}

export interface ServedFailure {
  /** "GET /repos/acme/models/issues/7/comments" style prefix of the request to fail. */
  readonly match: string;
  /**
   * status (default): answer `status`; reset: drop the connection without an answer; hang:
   * never answer.
   */
  readonly kind?: 'status' | 'reset' | 'hang';
  readonly status?: number;
  readonly headers?: Record<string, string>;
  /** The `message` of the error body (default "simulated failure"). */
  readonly message?: string;
  /** after: carry the request out first, then fail the answer (a write that did happen). */
  readonly when?: 'before' | 'after';
  /** How many matching requests fail before the fake answers normally. */
  times: number;
}

export interface ServedDelay {
  readonly match: string;
  readonly ms: number;
}

/** Holds matching requests until `count` of them have arrived (or `timeoutMs` passed). */
export interface ServedBarrier {
  readonly match: string;
  readonly count: number;
  readonly timeoutMs: number;
}

export interface RecordedRequest {
  readonly method: string;
  readonly path: string;
  readonly query: URLSearchParams;
  readonly authorization: string | undefined;
  readonly body: unknown;
}

/**
 * A stand-in for the few REST endpoints the action uses, on 127.0.0.1 only. Listing honours
 * per_page (default 30, at most 100) and page, and sends Link headers as GitHub does; writes can
 * be forbidden (a read-only token) and chosen requests can fail a given number of times.
 */
export class FakeGitHub {
  readonly comments: StoredComment[] = [];
  readonly pulls: StoredPull[] = [];
  readonly commitPulls = new Map<string, number[]>();
  readonly requests: RecordedRequest[] = [];
  readonly failures: ServedFailure[] = [];
  readonly delays: ServedDelay[] = [];
  barrier: ServedBarrier | null = null;
  private readonly held: (() => void)[] = [];
  forbidWrites = false;
  /**
   * What GET /user answers: null (as for the workflow's installation token) is a 403; a login
   * (as for a personal access token) is that user, who then also writes the comments.
   */
  userLogin: string | null = null;
  /** Path prefix of the API (e.g. "/api/v3" for GitHub Enterprise Server). */
  prefix = '';
  token = 'test-token';
  botUser = 'github-actions[bot]';
  private nextId = 5000;
  private readonly server = createServer((req, res) => {
    this.handle(req, res).catch((error: unknown) => send(res, 500, { message: String(error) }));
  });

  async start(): Promise<string> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    return this.origin;
  }

  get origin(): string {
    const { port } = this.server.address() as AddressInfo;
    return `http://127.0.0.1:${port}`;
  }

  async stop(): Promise<void> {
    this.server.closeAllConnections();
    await new Promise<void>((resolve) => this.server.close(() => resolve()));
  }

  /** Whom comments created through the API are written by. */
  get writer(): string {
    return this.userLogin ?? this.botUser;
  }

  addComment(issue: number, body: string, user = this.botUser): StoredComment {
    const comment = { id: this.nextId++, issue, body, user };
    this.comments.push(comment);
    return comment;
  }

  commentsOn(issue: number): StoredComment[] {
    return this.comments.filter((c) => c.issue === issue);
  }

  writes(): RecordedRequest[] {
    return this.requests.filter((r) => ['POST', 'PATCH', 'DELETE'].includes(r.method));
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', this.origin);
    const chunks: Buffer[] = [];
    for await (const chunk of req) chunks.push(chunk as Buffer);
    const text = Buffer.concat(chunks).toString('utf8');
    const body: unknown = text === '' ? undefined : JSON.parse(text);
    const method = req.method ?? 'GET';
    if (!url.pathname.startsWith(`${this.prefix}/`))
      return send(res, 404, { message: 'Not Found' });
    const path = url.pathname.slice(this.prefix.length);
    this.requests.push({
      method,
      path,
      query: url.searchParams,
      authorization: req.headers.authorization,
      body,
    });

    if (req.headers.authorization !== `token ${this.token}`) {
      return send(res, 401, { message: 'Bad credentials' });
    }
    const route = `${method} ${path}`;
    const delay = this.delays.find((d) => route.startsWith(d.match));
    if (delay !== undefined) await new Promise((resolve) => setTimeout(resolve, delay.ms));
    const barrier = this.barrier;
    if (barrier !== null && route.startsWith(barrier.match)) {
      await new Promise<void>((resolve) => {
        const timer = setTimeout(resolve, barrier.timeoutMs);
        this.held.push(() => {
          clearTimeout(timer);
          resolve();
        });
        if (this.held.length >= barrier.count) for (const release of this.held.splice(0)) release();
      });
    }
    const failure = this.failures.find((f) => f.times > 0 && route.startsWith(f.match));
    if (failure !== undefined) failure.times -= 1;
    const fail = (): void => {
      if (failure?.kind === 'hang') return;
      if (failure?.kind === 'reset') {
        res.socket?.destroy();
        return;
      }
      send(
        res,
        failure?.status ?? 500,
        { message: failure?.message ?? 'simulated failure' },
        failure?.headers,
      );
    };
    if (failure !== undefined && failure.when !== 'after') return fail();
    if (['POST', 'PATCH', 'DELETE'].includes(method) && this.forbidWrites) {
      return send(res, 403, { message: 'Resource not accessible by integration' });
    }
    // With a failure `after`, the request is carried out and its answer replaced.
    const respond =
      failure === undefined
        ? send
        : (): void => {
            fail();
          };
    return this.route(method, path, url, body, res, respond);
  }

  private route(
    method: string,
    path: string,
    url: URL,
    body: unknown,
    res: ServerResponse,
    send: (
      res: ServerResponse,
      status: number,
      data: unknown,
      headers?: Record<string, string>,
    ) => void,
  ) {
    if (path === '/user' && method === 'GET') {
      return this.userLogin === null
        ? send(res, 403, { message: 'Resource not accessible by integration' })
        : send(res, 200, { login: this.userLogin, id: 1, type: 'User' });
    }

    let m = /^\/repos\/acme\/models\/issues\/(\d+)\/comments$/.exec(path);
    if (m !== null && method === 'GET') {
      const issue = Number(m[1]);
      const perPage = Math.min(100, Number(url.searchParams.get('per_page') ?? '30'));
      const page = Number(url.searchParams.get('page') ?? '1');
      const all = this.commentsOn(issue);
      const last = Math.max(1, Math.ceil(all.length / perPage));
      const links: string[] = [];
      const link = (p: number, rel: string) => {
        const next = new URL(url.href);
        next.searchParams.set('page', String(p));
        next.searchParams.set('per_page', String(perPage));
        links.push(`<${next.href}>; rel="${rel}"`);
      };
      if (page < last) {
        link(page + 1, 'next');
        link(last, 'last');
      }
      if (page > 1) {
        link(1, 'first');
        link(page - 1, 'prev');
      }
      const data = all.slice((page - 1) * perPage, page * perPage).map((c) => this.toApi(c));
      return send(res, 200, data, links.length > 0 ? { link: links.join(', ') } : {});
    }
    if (m !== null && method === 'POST') {
      const comment = this.addComment(
        Number(m[1]),
        String((body as { body: string }).body),
        this.writer,
      );
      return send(res, 201, this.toApi(comment));
    }
    m = /^\/repos\/acme\/models\/issues\/comments\/(\d+)$/.exec(path);
    if (m !== null && method === 'DELETE') {
      const index = this.comments.findIndex((c) => c.id === Number(m?.[1]));
      if (index < 0) return send(res, 404, { message: 'Not Found' });
      this.comments.splice(index, 1);
      return send(res, 204, undefined);
    }
    if (m !== null && method === 'PATCH') {
      const comment = this.comments.find((c) => c.id === Number(m?.[1]));
      if (comment === undefined) return send(res, 404, { message: 'Not Found' });
      if (comment.user !== this.writer) {
        return send(res, 403, { message: 'Resource not accessible by integration' });
      }
      comment.body = String((body as { body: string }).body);
      return send(res, 200, this.toApi(comment));
    }
    m = /^\/repos\/acme\/models\/commits\/([0-9a-f]+)\/pulls$/.exec(path);
    if (m !== null && method === 'GET') {
      const numbers = this.commitPulls.get(m[1] ?? '') ?? [];
      return send(res, 200, this.pulls.filter((p) => numbers.includes(p.number)).map(toPull));
    }
    m = /^\/repos\/acme\/models\/pulls\/(\d+)$/.exec(path);
    if (m !== null && method === 'GET') {
      const pull = this.pulls.find((p) => p.number === Number(m?.[1]));
      return pull === undefined
        ? send(res, 404, { message: 'Not Found' })
        : send(res, 200, toPull(pull));
    }
    if (path === '/repos/acme/models/pulls' && method === 'GET') {
      const head = url.searchParams.get('head');
      const state = url.searchParams.get('state') ?? 'open';
      const found = this.pulls.filter(
        (p) => p.head === head && (state === 'all' || p.state === state),
      );
      return send(res, 200, found.map(toPull));
    }
    return send(res, 404, { message: `no fake for ${method} ${path}` });
  }

  private toApi(c: StoredComment) {
    return {
      id: c.id,
      body: c.body,
      user: { login: c.user },
      html_url: `https://github.example/acme/models/pull/${c.issue}#issuecomment-${c.id}`,
    };
  }
}

function toPull(p: StoredPull) {
  return { number: p.number, state: p.state, head: { sha: p.headSha, ref: p.head.split(':')[1] } };
}

function send(
  res: ServerResponse,
  status: number,
  data: unknown,
  headers: Record<string, string> = {},
): void {
  if (status === 204) {
    res.writeHead(204, headers);
    res.end();
    return;
  }
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', ...headers });
  res.end(JSON.stringify(data));
}
