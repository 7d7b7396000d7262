/**
 * Environment for the processes that analyse moulds (the API's checking thread, the worker, the
 * command): glibc's allocator asks for transparent huge pages for its big blocks (glibc 2.35 and
 * later; other C libraries ignore it). A 1M-triangle analysis touches tens of MB of fresh typed
 * arrays, and a 2 MB page faults once where 4 kB pages fault 512 times. The caller's own value wins.
 */
export const allocatorSettings: Record<string, string> = { GLIBC_TUNABLES: 'glibc.malloc.hugetlb=1' };
