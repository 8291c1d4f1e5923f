export declare const demoPassword: string;
export declare const demoSignIns: [email: string, who: string][];
