namespace CompressionMembers.Tests.Published;

/// <summary>
/// The published sources the tests in this folder check the library against, one constant per source, named as precisely
/// as the stored copy allows (title, edition, table or example, and the address of the stored copy). A test quotes the
/// value it expects beside its source; no expected value here is recalled from memory.
/// </summary>
internal static class PublishedSources
{
    /// <summary>EN 14080:2013 Tables 5 and 4 as reproduced on a reference web page.</summary>
    internal const string En14080 = "EN 14080:2013, characteristic values of homogeneous (GL..h) and combined (GL..c) glulam, as reproduced in " +
        "'Glulam Strength Capacities According To Eurocode', structuralbasics.com (https://www.structuralbasics.com/?p=6663)";

    /// <summary>Porteous &amp; Kermani, textbook, Table 5.3 and its worked examples (stored copy on eurocode.us).</summary>
    internal const string PorteousKermani = "J. Porteous, A. Kermani, Structural Timber Design to Eurocode 5 (Blackwell), Table 5.3 " +
        "'instability factor kc' (strength-class headers quote BS EN 338:2003) and the column examples of chapter 5, stored copy at " +
        "https://www.eurocode.us/structural-timber-design/ (pages info-rbu-1, info-mhu, info-fis-1, info-bjp-1)";

    /// <summary>The Engineering ToolBox strength-class table (bending strength and typical density per class).</summary>
    internal const string EngineeringToolbox = "The Engineering ToolBox, 'Softwood and Hardwood - Structural Strength Classes' " +
        "(BS EN 338), https://www.engineeringtoolbox.com/structural-softwood-strength-classes-d_1804.html";

    /// <summary>LVL Handbook Europe, 3rd revised edition 2025 (Federation of the Finnish Woodworking Industries).</summary>
    internal const string LvlHandbook = "LVL Handbook Europe, 3rd revised edition 2025, Federation of the Finnish Woodworking Industries " +
        "(ISBN 978-952-94-2346-0), stored copy at https://proofer.faktor.fi/epaper/LVLHandbook_2025/";

    /// <summary>Buchanan, Structural Design for Fire Safety, 2nd edition, Table 9.1.</summary>
    internal const string Buchanan = "A. H. Buchanan, Structural Design for Fire Safety, 2nd edition (Wiley, 2017), Table 9.1 " +
        "'Charring rates from Eurocode 5', p. 274, stored copy at https://fliphtml5.com/szqqx/gxoc/Structural_Design_for_Fire_Safety/295/";

    /// <summary>EN 1999-1-1:2007+A1:2009 Table 3.2b, read in a stored copy of the standard's text.</summary>
    internal const string En1999Table32b = "EN 1999-1-1:2007+A1:2009 Table 3.2b (extruded profiles, tube, rod/bar and drawn tube): " +
        "f0, fu, fo,haz, fu,haz, ρo,haz, ρu,haz and buckling class, stored copy at https://dnaop.com/html/60238_7.html";

    /// <summary>Kissell &amp; Ferry, Aluminum Structures, 2nd edition, section 5 (columns).</summary>
    internal const string KissellFerry = "J. R. Kissell, R. L. Ferry, Aluminum Structures: A Guide to Their Specifications and Design, " +
        "2nd edition (Wiley, 2002), column buckling, stored copies at https://tr.scribd.com/document/390433748/Aluminum-Manual-78-txt " +
        "and https://tr.scribd.com/document/390433853/Aluminum-Manual-79-txt";

    /// <summary>Hibbeler, Mechanics of Materials, chapter 13 worked examples.</summary>
    internal const string Hibbeler = "R. C. Hibbeler, Mechanics of Materials, chapter 13 'Buckling of Columns', Examples 13.1 and 13.2 " +
        "(SI units; edition not stated in the stored copy), stored copy at https://scribd.com/document/505697168/Ch13";

    /// <summary>American Wood Council, Wood Structural Design Data, 1992 revisions.</summary>
    internal const string AwcDesignData = "American Wood Council, Wood Structural Design Data, 1986 edition with 1992 revisions, " +
        "'Properties of structural lumber' (average specific gravity), stored copy at " +
        "https://studylib.net/doc/12742686/1992-revisions-wood-structural-design-data";
}
