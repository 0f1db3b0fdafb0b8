"""Independent transcription of src/core/random's seeding (seedWords, seedFor, createRng) from the
algorithms' descriptions: lowbias32 (C. Wellons, hash-prospector), splitmix32 increment 0x9e3779b9,
FNV-1a 32 (offset 0x811c9dc5, prime 0x01000193) over UTF-16 code units, xoshiro128** 1.1
(Blackman & Vigna, reference C code). Prints the values test/core/random/referenceVectors.test.ts
pins: a change to how seeds or streams are formed changes every published draw.
Run: /usr/bin/python3 scripts/reference/randomStreams.py
"""
M=0xffffffff
def mix32(x):
    x&=M; x^=x>>16; x=(x*0x21f0aaad)&M; x^=x>>15; x=(x*0x735a2d97)&M; x^=x>>15; return x
def imul(a,b): return (a*b)&M
def seedWords(seed):
    import math
    i=math.trunc(seed); frac=seed-i
    f=0 if frac==0 else math.floor(frac*4294967296)
    lo=(i%4294967296)&M if i>=0 else (int(math.fmod(i,4294967296)))&M
    hi=math.floor(i/4294967296)&M
    return [(lo ^ mix32(f))&M, hi]
def keyed(start,id_):
    h=start&M
    units=id_.encode('utf-16-le')
    for k in range(0,len(units),2):
        lo,hi=units[k],units[k+1]
        h=imul(h^lo,0x01000193)
        h=imul(h^hi,0x01000193)
    return mix32(h ^ (len(units)//2))
def seedFor(g,id_):
    lo,hi=seedWords(g)
    key=mix32(lo) ^ mix32((hi+0x9e3779b9)&M)
    low=keyed(0x811c9dc5 ^ key, id_)
    high=keyed(mix32(key ^ 0x85ebca6b) ^ 0x811c9dc5, id_) & 0x1fffff
    return high*4294967296+low
def sm(state):
    s=state&M
    def n():
        nonlocal s
        s=(s+0x9e3779b9)&M
        return mix32(s)
    return n
M=0xffffffff
def rotl(x,k): return ((x<<k)|(x>>(32-k)))&M
def xo(st):
    r=(rotl((st[1]*5)&M,7)*9)&M
    t=(st[1]<<9)&M
    st[2]^=st[0]; st[3]^=st[1]; st[1]^=st[2]; st[0]^=st[3]; st[2]^=t; st[3]=rotl(st[3],11)
    return r
def createRng(seed):
    lo,hi=seedWords(seed)
    n=sm(lo ^ mix32(hi ^ 0x6a09e667))
    st=[n(),n(),n(),n()]
    return [xo(st) for _ in range(4)]
for g, i in [(42, 'obj-001'), (0, ''), (20261202, 'CW-0007'), (2**40 + 7, 'é✓'), (-3, 'a'), (7.5, 'x')]:
    print('seedFor', repr(g), repr(i), seedFor(g, i))
for s in [7, 2**40 + 7, -7, 0.25, 20261202]:
    print('createRng', s, createRng(s))
