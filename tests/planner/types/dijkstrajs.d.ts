// Minimal typing for the reference Dijkstra implementation used by the shortest-path tests.
declare module 'dijkstrajs' {
  type Graph = Record<string, Record<string, number>>;
  const dijkstra: {
    find_path(graph: Graph, s: string, d: string): string[];
    single_source_shortest_paths(graph: Graph, s: string, d?: string): Record<string, string>;
  };
  export = dijkstra;
}
