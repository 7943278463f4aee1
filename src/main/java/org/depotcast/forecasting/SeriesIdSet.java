package org.depotcast.forecasting;

/**
 * The series ids read so far, as 64-bit hashes in an open-addressing table: 16 bytes a series at most, where the
 * ids themselves would take several times that. Two different ids share a hash with a probability of about
 * n² / 2⁶⁵ (3 in 100 million for a million series); such a pair would be refused as "not together".
 */
final class SeriesIdSet {
    private long[] slots = new long[1024];
    private int count;

    boolean add(String id) {
        long hash = hash(id);
        if (count * 2 >= slots.length) {
            grow();
        }
        return insert(slots, hash);
    }

    private boolean insert(long[] table, long hash) {
        int mask = table.length - 1;
        for (int i = (int) (hash ^ (hash >>> 32)) & mask; ; i = (i + 1) & mask) {
            if (table[i] == 0) {
                table[i] = hash;
                count++;
                return true;
            }
            if (table[i] == hash) {
                return false;
            }
        }
    }

    private void grow() {
        long[] old = slots;
        slots = new long[old.length * 2];
        count = 0;
        for (long hash : old) {
            if (hash != 0) {
                insert(slots, hash);
            }
        }
    }

    /** FNV-1a over the UTF-16 units with MurmurHash3's 64-bit finaliser; 0 is kept for an empty slot. */
    static long hash(String id) {
        long h = 0xcbf29ce484222325L;
        for (int i = 0; i < id.length(); i++) {
            h = (h ^ id.charAt(i)) * 0x100000001b3L;
        }
        h ^= h >>> 33;
        h *= 0xff51afd7ed558ccdL;
        h ^= h >>> 33;
        h *= 0xc4ceb93e53e3c2bdL;
        h ^= h >>> 33;
        return h == 0 ? 1 : h;
    }
}
