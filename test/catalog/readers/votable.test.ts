import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { makeTmpDir, readAll } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('votable');
afterAll(cleanup);

let n = 0;
async function read(xml: string, chunkRows?: number) {
  const path = join(dir, `t${n++}.vot`);
  writeFileSync(path, xml);
  const src = await openTable(path);
  return { src, ...(await readAll(src, chunkRows)) };
}

const wrap = (fields: string, rows: string, extra = '') => `<?xml version="1.0"?>
<VOTABLE version="1.3"><RESOURCE>${extra}<TABLE>${fields}<DATA><TABLEDATA>${rows}</TABLEDATA></DATA></TABLE></RESOURCE></VOTABLE>`;

describe('the VOTable reader', () => {
  it('decodes entities, character references and CDATA in cells', async () => {
    const { columns } = await read(wrap('<FIELD name="s" datatype="char" arraysize="*"/>',
      '<TR><TD>a &lt;b&gt; &amp; &quot;c&quot; &apos;d&apos;</TD></TR><TR><TD>&#65;&#x42;&#x1F600;</TD></TR><TR><TD><![CDATA[<raw> & stuff]]></TD></TR>'));
    expect(columns).toEqual([['a <b> & "c" \'d\'', 'AB😀', '<raw> & stuff']]);
  });

  it('treats VALUES null, empty TDs and NaN as null, reads Inf and hexadecimal integers, and keeps blanks around text', async () => {
    const { columns } = await read(wrap(
      '<FIELD name="n" datatype="int"><VALUES null="-999"/></FIELD><FIELD name="x" datatype="double"><VALUES null="-99.0"/></FIELD><FIELD name="s" datatype="char" arraysize="8"><VALUES null="none"/></FIELD><FIELD name="b" datatype="boolean"/>',
      '<TR><TD>-999</TD><TD>-99</TD><TD>none</TD><TD>?</TD></TR><TR><TD> 0x1F </TD><TD>NaN</TD><TD></TD><TD>TRUE</TD></TR><TR><TD/><TD>-Inf</TD><TD> padded </TD><TD>0</TD></TR>'));
    expect(columns).toEqual([[null, 31, null], [null, null, -Infinity], [null, null, ' padded '], [null, true, false]]);
  });

  it('collects DESCRIPTION, PARAMs, INFOs and the table name into meta, and FIELD metadata into columns', async () => {
    const { src } = await read(`<?xml version="1.0"?>
<!DOCTYPE VOTABLE>
<!-- invented -->
<VOTABLE version="1.4">
 <DESCRIPTION> Invented sample </DESCRIPTION>
 <INFO name="QUERY_STATUS" value="OK"/>
 <RESOURCE>
  <PARAM name="H0" datatype="double" value="70" unit="km/s/Mpc" ucd="phys.cosmology"><DESCRIPTION>Hubble constant</DESCRIPTION></PARAM>
  <PARAM name="label" datatype="char" arraysize="*" value="demo"/>
  <TABLE name="agn">
   <DESCRIPTION>The table</DESCRIPTION>
   <FIELD ID="c1" datatype="float" unit="km/s" ucd="spect.line.width"><DESCRIPTION>
     Line width
   </DESCRIPTION></FIELD>
   <DATA><TABLEDATA><TR><TD>1</TD></TR></TABLEDATA></DATA>
  </TABLE>
 </RESOURCE>
</VOTABLE>`);
    expect(src.columns).toEqual([{ name: 'c1', kind: 'float', unit: 'km/s', ucd: 'spect.line.width', description: 'Line width' }]);
    expect(src.meta).toEqual({
      description: 'Invented sample',
      tableName: 'agn',
      tableDescription: 'The table',
      params: {
        H0: { value: 70, datatype: 'double', unit: 'km/s/Mpc', ucd: 'phys.cosmology', description: 'Hubble constant' },
        label: { value: 'demo', datatype: 'char' },
      },
      infos: { QUERY_STATUS: 'OK' },
    });
  });

  it('reads namespace-prefixed elements and only the first TABLE', async () => {
    const { src, columns } = await read(`<?xml version="1.0"?>
<v:VOTABLE xmlns:v="http://www.ivoa.net/xml/VOTable/v1.3"><v:RESOURCE>
<v:TABLE><v:FIELD name="a" datatype="short"/><v:DATA><v:TABLEDATA><v:TR><v:TD>1</v:TD></v:TR><v:TR><v:TD>2</v:TD></v:TR></v:TABLEDATA></v:DATA></v:TABLE>
<v:TABLE><v:FIELD name="b" datatype="char" arraysize="*"/><v:DATA><v:TABLEDATA><v:TR><v:TD>other</v:TD></v:TR></v:TABLEDATA></v:DATA></v:TABLE>
</v:RESOURCE></v:VOTABLE>`);
    expect(src.columns.map((c) => c.name)).toEqual(['a']);
    expect(src.nRows).toBe(2);
    expect(columns).toEqual([[1, 2]]);
  });

  it('keeps a long column beyond 2^53 as exact decimal text', async () => {
    const { src, columns } = await read(wrap('<FIELD name="id" datatype="long"/>', '<TR><TD>9007199254740993</TD></TR><TR><TD>5</TD></TR><TR><TD/></TR>'));
    expect(src.columns[0]!.kind).toBe('string');
    expect(columns).toEqual([['9007199254740993', '5', null]]);
  });
});
