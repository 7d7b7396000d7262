/**
 * Environment for the processes npm start runs (the API, whose checking thread analyses uploads, the
 * worker, the mail sink) and the benches start: glibc's allocator asks for transparent huge pages for its big blocks (glibc 2.35 and
 * later; other C libraries ignore it). A 1M-triangle analysis touches tens of MB of fresh typed
 * arrays, and a 2 MB page faults once where 4 kB pages fault 512 times. The caller's own value wins.
 */
export const allocatorSettings: Record<string, string> = { GLIBC_TUNABLES: 'glibc.malloc.hugetlb=1' };
